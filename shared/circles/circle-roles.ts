/** Roles inside one circle; separate from the account roles (reader / admin). */
export const CIRCLE_ROLES = ['host', 'member'] as const;
export type CircleRole = (typeof CIRCLE_ROLES)[number];

/** One membership as the rules see it. */
export interface Membership {
  readonly userId: string;
  readonly role: CircleRole;
}

/** Why a membership action is refused, in words a reader can act on; `null` when allowed. */
export type Refusal = string | null;

const hostsOf = (members: readonly Membership[]) => members.filter((member) => member.role === 'host');

/** Hosts invite, rotate the join code, edit the schedule and picks, and hide posts. */
export const isHost = (role: CircleRole | null | undefined): boolean => role === 'host';

/** A host removes anyone but themselves (they leave instead); removing another host is allowed, so a circle never gets stuck. */
export function removeRefusal(actor: Membership | undefined, targetId: string, members: readonly Membership[]): Refusal {
  if (!actor || !isHost(actor.role)) return 'Only a host can remove members';
  if (actor.userId === targetId) return 'Use Leave to leave the circle yourself';
  if (!members.some((member) => member.userId === targetId)) return 'This reader is not in the circle';
  return null;
}

/** A host hands hosting to another member; `keepHosting` false makes the actor a member. */
export function handOverRefusal(actor: Membership | undefined, targetId: string, members: readonly Membership[]): Refusal {
  if (!actor || !isHost(actor.role)) return 'Only a host can hand over hosting';
  const target = members.find((member) => member.userId === targetId);
  if (!target) return 'This reader is not in the circle';
  if (target.userId === actor.userId) return 'You are already a host';
  return null;
}

/**
 * Anyone can leave, except the last host of a circle that still has other members: they hand
 * over hosting first, so no circle is left without someone to look after it. The last reader of
 * a circle may leave; the circle then closes.
 */
export function leaveRefusal(actor: Membership | undefined, members: readonly Membership[]): Refusal {
  if (!actor) return 'You are not in this circle';
  const otherHosts = hostsOf(members).filter((host) => host.userId !== actor.userId);
  if (isHost(actor.role) && otherHosts.length === 0 && members.length > 1) return 'Hand over hosting to another member before you leave';
  return null;
}
