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
  readonly value: unknown;
  readonly hlc: string;
  /** Mergeable texts: the base64 Yjs state behind `value` (the text it shows). */
  readonly state?: unknown;
}

export interface PushRequest {
  readonly deviceId: string;
  readonly changes: readonly FieldChange[];
}

export interface PushResponse {
  readonly applied: number;
  readonly duplicates: number;
  readonly serverTime: string;
}

export interface PullResponse {
  readonly changes: readonly PulledChange[];
  /** Opaque: send it back as `since` to continue. */
  readonly cursor: string;
  readonly hasMore: boolean;
  readonly serverTime: string;
}

/** At most this many changes in one push, and this many bytes of body. */
export const MAX_PUSH_CHANGES = 1000;
export const MAX_PUSH_BYTES = 1024 * 1024;
export const MAX_PULL_LIMIT = 5000;

/** Why one change of a refused batch was refused. */
export interface ChangeProblem {
  readonly index: number;
  readonly id?: string;
  readonly code: string;
  readonly reason: string;
}
