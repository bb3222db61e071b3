import { compareBytes } from './or-set';

/** A value of one field together with the clock that wrote it. */
export interface Stamped<T = unknown> {
  readonly value: T;
  readonly hlc: string;
}

/**
 * Last writer wins, per field: the greater clock wins. Clocks compare as plain strings; the
 * node id at the end breaks ties between equal wall time and counter. Equal clocks should mean
 * the same write; if two different values ever carry one clock (a device that reused its id),
 * the greater value in {@link canonicalText} order wins, on every device and on the server alike.
 *
 * @example
 * mergeField({ value: 'A', hlc: '…:00000:a' }, { value: 'B', hlc: '…:00001:a' }) // the second
 */
export function mergeField<T>(current: Stamped<T> | undefined, incoming: Stamped<T>): Stamped<T> {
  return wins(incoming.hlc, current?.hlc, incoming.value, current?.value) ? incoming : current!;
}

/**
 * Whether `incoming` would replace `current` under {@link mergeField}. Without values, equal
 * clocks never win.
 */
export function wins(incomingHlc: string, currentHlc: string | undefined | null, incomingValue?: unknown, currentValue?: unknown): boolean {
  if (currentHlc === undefined || currentHlc === null || incomingHlc > currentHlc) return true;
  if (incomingHlc < currentHlc || arguments.length < 4) return false;
  return compareBytes(canonicalText(incomingValue), canonicalText(currentValue)) > 0;
}

/**
 * A value's text exactly as PostgreSQL prints it as jsonb (`to_jsonb(value)::text`): `", "`
 * between items, `": "` after keys, keys shorter-first then bytewise (the jsonb key order), and
 * strings escaped as JSON. The server breaks equal-clock ties on the same text, in byte order.
 */
export function canonicalText(value: unknown): string {
  if (value === null || value === undefined) return 'null';
  if (Array.isArray(value)) return `[${value.map(canonicalText).join(', ')}]`;
  if (typeof value === 'object') {
    const keys = Object.keys(value).sort((x, y) => utf8Length(x) - utf8Length(y) || compareBytes(x, y));
    return `{${keys.map((key) => `${JSON.stringify(key)}: ${canonicalText((value as Record<string, unknown>)[key])}`).join(', ')}}`;
  }
  return JSON.stringify(value);
}

function utf8Length(text: string): number {
  let length = 0;
  for (const char of text) {
    const code = char.codePointAt(0)!;
    length += code < 0x80 ? 1 : code < 0x800 ? 2 : code < 0x10000 ? 3 : 4;
  }
  return length;
}
