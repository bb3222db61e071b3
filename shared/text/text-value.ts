import { fromBase64, toBase64 } from 'lib0/buffer';

/**
 * A mergeable text on the wire. A push carries one Yjs update (v1 encoding, base64); a pull
 * carries the text's whole compact state and the text it shows, which is exactly what a device
 * shows after applying that state.
 */
export interface TextUpdateValue {
  readonly yjs: string;
}
export interface PulledTextValue extends TextUpdateValue {
  readonly text: string;
}

/** RFC 4648 §4 base64 with padding: anything else is refused rather than silently skipped. */
const BASE64 = /^(?:[A-Za-z0-9+/]{4})*(?:[A-Za-z0-9+/]{2}==|[A-Za-z0-9+/]{3}=)?$/;

export const isTextUpdateValue = (value: unknown): value is TextUpdateValue =>
  typeof value === 'object' && value !== null && typeof (value as { yjs?: unknown }).yjs === 'string';

export const encodeTextBytes = (bytes: Uint8Array): string => toBase64(bytes);

/** The bytes of a base64 text, or null when it is not strict base64. */
export function decodeTextBytes(base64: string): Uint8Array | null {
  return BASE64.test(base64) ? fromBase64(base64) : null;
}
