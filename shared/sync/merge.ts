/** A value of one field together with the clock that wrote it. */
export interface Stamped<T = unknown> {
  readonly value: T;
  readonly hlc: string;
}

/**
 * Last writer wins, per field: the greater clock wins. Clocks compare as plain strings; the
 * node id at the end breaks ties between equal wall time and counter. Equal clocks mean the same
 * write, so either side may be kept (idempotence).
 *
 * @example
 * mergeField({ value: 'A', hlc: '…:00000:a' }, { value: 'B', hlc: '…:00001:a' }) // the second
 */
export function mergeField<T>(current: Stamped<T> | undefined, incoming: Stamped<T>): Stamped<T> {
  return current && current.hlc >= incoming.hlc ? current : incoming;
}

/** Whether `incoming` would replace `current` under {@link mergeField}. */
export function wins(incomingHlc: string, currentHlc: string | undefined | null): boolean {
  return currentHlc === undefined || currentHlc === null || incomingHlc > currentHlc;
}
