import type { FieldChange } from '../api/sync';
import type { CircleRole } from './circle-roles';

/** A member as the circle sees them: a display name and a role, nothing of their journal. */
export interface CircleMemberView {
  readonly userId: string;
  readonly displayName: string;
  readonly role: CircleRole;
}

/** `GET /api/circles` item. */
export interface CircleSummary {
  readonly id: string;
  readonly name: string;
  readonly role: CircleRole;
  readonly memberCount: number;
}

/** `GET /api/circles/:id`: hosts also get the join code. */
export interface CircleDetails {
  readonly id: string;
  readonly role: CircleRole;
  readonly joinCode?: string;
  readonly members: readonly CircleMemberView[];
}

/** One pulled row: each field's winning value and clock, and who wrote the row first. */
export interface CirclePulledRow {
  readonly collection: string;
  readonly id: string;
  readonly authorId: string;
  readonly fields: Readonly<Record<string, { readonly value: unknown; readonly hlc: string }>>;
}

export interface CirclePullResponse {
  readonly rows: readonly CirclePulledRow[];
  readonly cursor: string;
  readonly hasMore: boolean;
  readonly members: readonly CircleMemberView[];
  readonly role: CircleRole;
  readonly serverTime: string;
}

export interface CirclePushRequest {
  readonly changes: readonly FieldChange[];
}

/** Error codes a device acts on: the first means "you are not (or no longer) in this circle". */
export const NOT_A_MEMBER = 'not_a_member';
export const NOT_A_MEMBER_TEXT = 'You are not a member of this circle (any more); changes waiting for it cannot be sent';
