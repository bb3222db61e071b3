import { sessionProblems } from './session-problems';

const now = Date.parse('2026-03-08T22:00:00Z');
const session = (from: string, to: string, extra = {}) => ({ id: 'new', startedAt: `2026-03-08T${from}:00Z`, endedAt: `2026-03-08T${to}:00Z`, ...extra });

describe('sessionProblems', () => {
  it('accepts an ordinary session', () => {
    expect(sessionProblems(session('19:00', '19:40', { activeMinutes: 35, fromPosition: 10, toPosition: 42 }), [], now)).toEqual({});
  });

  it('refuses negative, future and over-20-hour sessions with a reason each', () => {
    expect(sessionProblems(session('19:00', '18:00'), [], now)).toEqual({ endedAt: 'The session ends before it starts' });
    expect(sessionProblems(session('21:00', '23:30'), [], now)).toEqual({ endedAt: 'The session ends in the future' });
    expect(sessionProblems({ id: 'x', startedAt: '2026-03-07T01:00:00Z', endedAt: '2026-03-08T21:30:00Z' }, [], now)).toEqual({
      endedAt: 'A session cannot last more than 20 hours',
    });
    expect(sessionProblems(session('19:00', '19:30', { activeMinutes: 45 }), [], now)).toEqual({ activeMinutes: 'More minutes than the session lasted' });
    expect(sessionProblems(session('19:00', '19:30', { fromPosition: 50, toPosition: 40 }), [], now)).toEqual({
      toPosition: 'It ends before where it started in the book',
    });
  });

  it('refuses overlapping sessions but allows one to start when another ends', () => {
    const others = [{ id: 'a', startedAt: '2026-03-08T18:00:00Z', endedAt: '2026-03-08T18:30:00Z' }];
    expect(sessionProblems(session('18:20', '18:50'), others, now)).toEqual({ startedAt: 'It overlaps another session (18:00–18:30 UTC)' });
    expect(sessionProblems(session('18:30', '18:50'), others, now)).toEqual({});
    expect(sessionProblems({ ...others[0]!, endedAt: '2026-03-08T18:45:00Z' }, others, now)).toEqual({}); // editing itself
  });
});
