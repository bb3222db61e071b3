import type { OrSetState } from '../sync/or-set';

/**
 * The sync API (`POST /api/sync/push`, `GET /api/sync/pull`, `GET /api/sync/events`): what the
 * device sends and what the server answers, with the limits both sides keep.
 */

/**
 * One change to one field of one row: the unit the outbox keeps, the client pushes and the
 * server merges. `id` is unique per change so a re-sent batch is applied once.
 */
export interface FieldChange {
  readonly id: string;
  readonly collection: string;
  readonly rowId: string;
  readonly field: string;
  readonly value: unknown;
  readonly hlc: string;
}

/** A field's current winning value, as a pull returns it. */
export interface PulledChange {
  readonly collection: string;
  readonly rowId: string;
  readonly field: string;
  /** For a set field, its current elements (what an older app applies as a whole list). */
  readonly value: unknown;
  /** The field's clock: for a set field, the greatest clock it has seen. */
  readonly hlc: string;
  /** Set fields: the per-element state, joined into the device's own; mergeable texts: the base64 Yjs state behind `value`. */
  readonly state?: OrSetState | string;
}

export interface PushRequest {
  readonly deviceId: string;
  readonly changes: readonly FieldChange[];
}

export interface PushResponse {
  /** Changes that took effect. */
  readonly applied: number;
  /** Changes the server already had (a re-send). */
  readonly duplicates: number;
  /** Changes that lost to a write with a greater clock (another device's, usually). */
  readonly superseded: number;
  /** The superseded changes by id, with the clock that beat each. */
  readonly overwritten: readonly { readonly id: string; readonly by: string }[];
  readonly serverTime: string;
}

export interface PullResponse {
  readonly changes: readonly PulledChange[];
  /** Opaque: send it back as `since` to continue. */
  readonly cursor: string;
  readonly hasMore: boolean;
  /** While `hasMore`: about how many rows are still to pull after this page (for progress). */
  readonly remaining?: number;
  readonly serverTime: string;
}

/** At most this many changes in one push, and this many bytes of body. */
export const MAX_PUSH_CHANGES = 1000;
export const MAX_PUSH_BYTES = 1024 * 1024;
export const MAX_PULL_LIMIT = 5000;
/** A pull page holds about this much JSON at most (always at least one row). */
export const MAX_PULL_BYTES = 2 * 1024 * 1024;

/** Why one change of a refused batch was refused. */
export interface ChangeProblem {
  readonly index: number;
  readonly id?: string;
  readonly code: string;
  readonly reason: string;
}
