import type { Book, Session } from '@shared/sync/schema/collections';

import { changedStopFields, stopFields, stopFormPrefill, stopProblems } from './stop-form-model';

const NOW = Date.parse('2026-03-08T21:00:00Z');

function session(fields: Partial<Session> = {}): Session {
  return {
    id: 'this',
    bookId: 'b',
    startedAt: '2026-03-08T20:14:00.000Z',
    endedAt: '2026-03-08T20:39:00.000Z',
    activeMinutes: 25,
    fromPosition: 88,
    deleted: false,
    ...fields,
  } as Session;
}

describe('the stop form', () => {
  const audio = { id: 'b', format: 'audiobook', audioMinutes: 665 } as Book;
  const print = { id: 'b', format: 'print', pageCount: 320 } as Book;

  it('opens with where the previous session ended, its ebook location and playback speed', () => {
    const previous = [
      session({ id: 'p1', startedAt: '2026-03-06T08:00:00Z', toPosition: 60, playbackSpeed: 1.25, ebookLocation: 'Loc 900' }),
      session({ id: 'p2', startedAt: '2026-03-07T08:00:00Z', toPosition: 88 }),
    ];
    expect(stopFormPrefill(session(), previous)).toEqual({ toPosition: 88, ebookLocation: 'Loc 900', playbackSpeed: 1.25, mood: '', note: '' });
    // With no previous session: where this one started.
    expect(stopFormPrefill(session({ fromPosition: 12 }), []).toPosition).toBe(12);
    // What the session already says comes first.
    expect(stopFormPrefill(session({ toPosition: 101, mood: 'calm' }), previous)).toEqual(jasmine.objectContaining({ toPosition: 101, mood: 'calm' }));
  });

  it('keeps a speed only for audiobooks and a location only for ebooks, and writes only what changed', () => {
    const value = { toPosition: 140, ebookLocation: ' Loc 1200 ', playbackSpeed: 1.5, mood: '' as const, note: '  ' };
    expect(stopFields(value, audio)).toEqual({ toPosition: 140, ebookLocation: null, playbackSpeed: 1.5, mood: null, note: null });
    expect(stopFields(value, { format: 'ebook' }).ebookLocation).toBe('Loc 1200');

    const stored = session({ playbackSpeed: 1.5 });
    expect(changedStopFields(stored, stopFields(value, audio))).toEqual({ toPosition: 140 });
  });

  it('refuses a position past the end of the book or before where the session started, per field', () => {
    expect(stopProblems(print, session(), { toPosition: 321 }, [], NOW).fields).toEqual({ toPosition: 'The book has 320 pages' });
    expect(stopProblems(audio, session(), { toPosition: 700 }, [], NOW).fields).toEqual({ toPosition: 'The book is 11 h 5 min long' });
    expect(stopProblems({ format: 'ebook' } as Book, session(), { toPosition: 101 }, [], NOW).fields).toEqual({ toPosition: 'A percent is at most 100' });
    expect(stopProblems(print, session(), { toPosition: 50 }, [], NOW).fields).toEqual({ toPosition: 'It ends before where it started in the book' });
    expect(stopProblems(audio, session(), { toPosition: 120, playbackSpeed: 5 }, [], NOW).fields).toEqual({ playbackSpeed: 'Choose a speed from 0.5 to 4' });
    expect(stopProblems(print, session(), { toPosition: 120 }, [], NOW)).toEqual({ fields: {}, session: [] });
  });

  it('reports what is wrong with the session’s times apart, as they are not the form’s to fix', () => {
    const other = session({ id: 'manual', startedAt: '2026-03-08T20:00:00.000Z', endedAt: '2026-03-08T20:30:00.000Z' });
    const problems = stopProblems(print, session(), { toPosition: 120 }, [other], NOW);
    expect(problems.fields).toEqual({});
    expect(problems.session).toEqual(['It overlaps another session (20:00–20:30 UTC)']);
  });
});
