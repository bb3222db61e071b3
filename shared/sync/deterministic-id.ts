import { v5 as uuidV5 } from 'uuid';

/** Our own namespace for name-based ids (a random UUID, fixed for good). */
export const LAMPLIGHT_NAMESPACE = '4b0c8f3e-6d1a-4e57-9a55-2f7c1e0b9d64';

/**
 * The same row id on every device for things there is only one of per key — the pick of a
 * month, a starter label — so two devices creating it offline write to one row and the per-field
 * merge settles it, instead of leaving two rows. A name-based UUID (version 5, RFC 9562 §5.5).
 *
 * @example
 * deterministicId('month-pick', '2026-03') // always the same UUID
 */
export function deterministicId(kind: string, key: string): string {
  return uuidV5(`${kind}:${key}`, LAMPLIGHT_NAMESPACE);
}
