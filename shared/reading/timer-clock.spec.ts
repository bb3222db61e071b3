import fc from 'fast-check';

import type { Timer } from '../sync/schema/collections';
import { pauseTimer, resumeTimer, sessionFromTimer, startTimer, timerElapsedMs } from './timer-clock';
import { expectProperty } from '../testing/expect-property';

const at = (hhmm: string) => Date.parse(`2026-03-08T${hhmm}:00.000Z`);
const begin = (): Timer => ({ id: 't', ...startTimer(at('20:00'), { bookId: 'b', deviceId: 'd', deviceName: 'Tablet' }) });
const apply = (timer: Timer, patch: Partial<Timer>): Timer => ({ ...timer, ...patch });

describe('the stored timer', () => {
  it('counts from timestamps, leaving pauses out (worked example: 20:00–20:30 with a 5-minute pause = 25 min)', () => {
    let timer = begin();
    timer = apply(timer, pauseTimer(timer, at('20:10')));
    expect(timerElapsedMs(timer, at('20:14'))).toBe(10 * 60_000); // paused: the clock stands still
    timer = apply(timer, resumeTimer(timer, at('20:15')));
    expect(timerElapsedMs(timer, at('20:30'))).toBe(25 * 60_000);
  });

  it('survives any amount of time away: elapsed depends only on the stored fields and now', () => {
    const timer = begin();
    const copy = JSON.parse(JSON.stringify(timer)) as Timer; // as if reloaded from storage
    expect(timerElapsedMs(copy, at('23:00'))).toBe(timerElapsedMs(timer, at('23:00')));
  });

  it('leaves a session with the active minutes of the timer', () => {
    let timer = begin();
    timer = apply(timer, pauseTimer(timer, at('20:20')));
    timer = apply(timer, resumeTimer(timer, at('20:30')));
    expect(sessionFromTimer(timer, at('20:45'))).toEqual({
      bookId: 'b',
      startedAt: '2026-03-08T20:00:00.000Z',
      endedAt: '2026-03-08T20:45:00.000Z',
      activeMinutes: 35,
      fromPosition: null,
      source: 'timer',
    });
  });

  it('never counts more than the wall time, whatever the pauses (property)', () => {
    expectProperty(
      fc.property(fc.array(fc.integer({ min: 1, max: 3_600_000 }), { maxLength: 12 }), (gaps) => {
        let now = at('08:00');
        let timer = begin();
        timer = { ...timer, startedAt: new Date(now).toISOString() };
        const start = now;
        for (const gap of gaps) {
          now += gap;
          timer = apply(timer, timer.state === 'running' ? pauseTimer(timer, now) : resumeTimer(timer, now));
        }
        const elapsed = timerElapsedMs(timer, now + 1000);
        return elapsed >= 0 && elapsed <= now + 1000 - start;
      }),
    );
  });
});
