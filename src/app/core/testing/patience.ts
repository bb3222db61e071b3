/**
 * How long a spec waits for something asynchronous (a live query's answer, a request sent after
 * a Web Lock) before it fails. Generous: `npm test` runs the unit specs beside the e2e specs and
 * a build on two cores, where the browser can wait seconds for the CPU; a passing spec never
 * waits this long. `performance.now()`, because some specs mock `Date`.
 */
export const PATIENCE_MS = 10_000;

/** When a wait that starts now must give up. */
export function patienceDeadline(): number {
  return performance.now() + PATIENCE_MS;
}

/** Whether a wait with this deadline may go on. */
export function stillPatient(deadline: number): boolean {
  return performance.now() < deadline;
}
