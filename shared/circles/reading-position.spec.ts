import { readingPositionOf } from './reading-position';

describe('reading position for the spoiler shield', () => {
  it('takes the furthest session end in the book’s own unit', () => {
    expect(readingPositionOf({ format: 'print', status: 'reading' }, [{ toPosition: 40 }, { toPosition: 120 }, { toPosition: 90 }])).toEqual({
      unit: 'page',
      value: 120,
    });
    expect(readingPositionOf({ format: 'ebook' }, [{ toPosition: 33 }])).toEqual({ unit: 'percent', value: 33 });
    expect(readingPositionOf({ format: 'audiobook' }, [{ toPosition: 300 }, { toPosition: 500, deleted: true }])).toEqual({ unit: 'minute', value: 300 });
  });

  it('puts a finished book at the end and an unread one nowhere', () => {
    expect(readingPositionOf({ format: 'print', status: 'finished' }, [])).toEqual({ unit: 'percent', value: 100 });
    expect(readingPositionOf({ format: 'print' }, [])).toBeNull();
    expect(readingPositionOf(undefined, [{ toPosition: 10 }])).toBeNull();
  });
});
