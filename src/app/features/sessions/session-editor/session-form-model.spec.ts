import { changedSessionFields, EMPTY_SESSION_FORM, readSessionForm, spanMinutes, toSessionForm } from './session-form-model';

describe('session form model', () => {
  const print = { format: 'print' as const, pageCount: 300 };
  const form = { ...EMPTY_SESSION_FORM, startedAt: '2026-03-07T23:30', endedAt: '2026-03-08T00:15', fromPosition: '10', toPosition: '40' };

  it('reads the times in the reader’s zone and stores UTC', () => {
    // IANA tz database: Los Angeles is UTC−8 on 7 March 2026, Tokyo UTC+9.
    expect(readSessionForm(form, print, 'America/Los_Angeles').fields).toEqual(
      jasmine.objectContaining({ startedAt: '2026-03-08T07:30:00.000Z', endedAt: '2026-03-08T08:15:00.000Z' }),
    );
    expect(readSessionForm(form, print, 'Asia/Tokyo').fields.startedAt).toBe('2026-03-07T14:30:00.000Z');
  });

  it('takes the whole span for active minutes left blank, and the typed minutes otherwise', () => {
    expect(readSessionForm(form, print, 'UTC').fields.activeMinutes).toBe(45);
    expect(readSessionForm({ ...form, activeMinutes: '30,5' }, print, 'UTC').fields.activeMinutes).toBe(30.5);
    // The night clocks go forward in Los Angeles (8 March 2026, 02:00 → 03:00) is an hour short.
    expect(spanMinutes('2026-03-08T01:30', '2026-03-08T03:30', 'America/Los_Angeles')).toBe(60);
  });

  it('turns blanks into null and keeps format-only fields to their format', () => {
    const fields = readSessionForm({ ...form, ebookLocation: 'Loc 80', playbackSpeed: '1.5', note: '  ' }, print, 'UTC').fields;
    expect(fields).toEqual(jasmine.objectContaining({ ebookLocation: null, playbackSpeed: null, mood: null, note: null }));
    const audio = readSessionForm({ ...form, playbackSpeed: '1.5', toPosition: '95' }, { format: 'audiobook', audioMinutes: 665 }, 'UTC');
    expect(audio.fields.playbackSpeed).toBe(1.5);
    const ebook = readSessionForm({ ...form, ebookLocation: ' Loc 80 ' }, { format: 'ebook' }, 'UTC');
    expect(ebook.fields.ebookLocation).toBe('Loc 80');
  });

  it('says what cannot be read, and positions past the end of the book', () => {
    expect(readSessionForm({ ...form, startedAt: '', activeMinutes: 'lots', toPosition: '301' }, print, 'UTC').problems).toEqual({
      activeMinutes: 'Use a number',
      toPosition: 'The book has 300 pages',
    });
    expect(readSessionForm({ ...form, toPosition: '101' }, { format: 'ebook' }, 'UTC').problems).toEqual({ toPosition: 'Percent goes up to 100' });
    expect(readSessionForm({ ...form, fromPosition: '-2' }, print, 'UTC').problems).toEqual({ fromPosition: 'Cannot be negative' });
    expect(readSessionForm({ ...form, playbackSpeed: '5' }, { format: 'audiobook' }, 'UTC').problems).toEqual({
      playbackSpeed: 'Use a speed from 0.5 to 4',
    });
  });

  it('shows a stored session in the reader’s zone, to the minute', () => {
    const shown = toSessionForm(
      { id: 's1', startedAt: '2026-03-08T07:30:12.345Z', endedAt: '2026-03-08T08:00:00Z', activeMinutes: 28.5, mood: 'calm' },
      'Asia/Tokyo',
    );
    expect(shown).toEqual({ ...EMPTY_SESSION_FORM, startedAt: '2026-03-08T16:30', endedAt: '2026-03-08T17:00', activeMinutes: '28.5', mood: 'calm' });
  });

  it('sends only the fields whose text changed, so a timer’s seconds survive an edit of the note', () => {
    const before = { ...form, activeMinutes: '45' };
    const after = { ...before, note: 'Read on the train' };
    const fields = readSessionForm(after, print, 'UTC').fields;
    expect(changedSessionFields(before, after, fields)).toEqual({ note: 'Read on the train' });
  });

  it('counts blank active minutes as changed when the times move', () => {
    const before = { ...form };
    const after = { ...form, endedAt: '2026-03-08T00:45' };
    expect(changedSessionFields(before, after, readSessionForm(after, print, 'UTC').fields)).toEqual({
      endedAt: '2026-03-08T00:45:00.000Z',
      activeMinutes: 75,
    });
  });
});
