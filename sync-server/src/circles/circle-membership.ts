import { randomBytes, randomUUID } from 'node:crypto';

import type { DataSource, EntityManager } from 'typeorm';

import { handOverRefusal, leaveRefusal, removeRefusal, type CircleRole, type Membership } from '../../../shared/circles/circle-roles';
import type { CircleDetails, CircleMemberView, CircleSummary } from '../../../shared/circles/circle-wire';
import { joinCodeFrom, normalizeJoinCode } from '../../../shared/circles/invitations';
import { HlcClock } from '../../../shared/sync/hlc';
import { AppError } from '../errors';
import { notAMember, roleIn } from './circle-sync-store';

/** Rows the server itself writes (a new circle's name) carry clocks of this node. */
const SERVER_CLOCK = new HlcClock('circle-server');

const newJoinCode = () => joinCodeFrom(() => randomBytes(16));

export async function membersOf(manager: Pick<EntityManager, 'query'>, circleId: string): Promise<CircleMemberView[]> {
  const rows: { user_id: string; display_name: string; role: CircleRole }[] = await manager.query(
    `SELECT m.user_id, u.display_name, m.role FROM circle_members m JOIN users u ON u.id = m.user_id
      WHERE m.circle_id = $1 ORDER BY m.role, m.joined_at, m.user_id`,
    [circleId],
  );
  return rows.map((row) => ({ userId: row.user_id, displayName: row.display_name, role: row.role }));
}

const asMemberships = (members: readonly CircleMemberView[]): Membership[] => members.map(({ userId, role }) => ({ userId, role }));

/** Circles and who is in them: creating, joining by code, removing, handing over hosting, leaving. */
export class CircleMembership {
  constructor(private readonly dataSource: DataSource) {}

  async list(userId: string): Promise<CircleSummary[]> {
    const rows: { id: string; name: string | null; role: CircleRole; members: number }[] = await this.dataSource.query(
      `SELECT m.circle_id AS id, r.fields->>'name' AS name, m.role,
              (SELECT count(*)::int FROM circle_members o WHERE o.circle_id = m.circle_id) AS members
         FROM circle_members m LEFT JOIN circle_rows r ON r.collection = 'circles' AND r.id = m.circle_id
        WHERE m.user_id = $1 ORDER BY m.joined_at`,
      [userId],
    );
    return rows.map((row) => ({ id: row.id, name: row.name ?? '', role: row.role, memberCount: row.members }));
  }

  /** A new circle with the caller as its host; its name and description become the circle's first synced row. */
  async create(userId: string, name: string, description: string | null): Promise<{ id: string }> {
    const id = randomUUID();
    await this.dataSource.transaction(async (manager) => {
      await manager.query('INSERT INTO circles (id, join_code) VALUES ($1, $2)', [id, newJoinCode()]);
      await manager.query(`INSERT INTO circle_members (circle_id, user_id, role) VALUES ($1, $2, 'host')`, [id, userId]);
      const hlc = SERVER_CLOCK.tick();
      await manager.query(
        `INSERT INTO circle_rows (collection, id, circle_id, author_id, fields, clocks, seq) VALUES ('circles', $1, $1, $2, $3, $4, nextval('circle_seq'))`,
        [
          id,
          userId,
          JSON.stringify({ circleId: id, name, description, deleted: false }),
          JSON.stringify({ circleId: hlc, name: hlc, description: hlc, deleted: hlc }),
        ],
      );
    });
    return { id };
  }

  /** Who is in the circle now (the caller's membership is checked by the caller). */
  members(circleId: string): Promise<CircleMemberView[]> {
    return membersOf(this.dataSource.manager, circleId);
  }

  async details(circleId: string, userId: string): Promise<CircleDetails> {
    const role = await roleIn(this.dataSource.manager, circleId, userId);
    const [circle] = (await this.dataSource.query('SELECT join_code FROM circles WHERE id = $1', [circleId])) as { join_code: string }[];
    return { id: circleId, role, ...(role === 'host' ? { joinCode: circle!.join_code } : {}), members: await membersOf(this.dataSource.manager, circleId) };
  }

  /** Joins by a code a host shared; the same answer for a wrong code as for none (no circle is told). */
  async joinByCode(userId: string, typed: string): Promise<{ id: string }> {
    const code = normalizeJoinCode(typed);
    const refused = new AppError(404, 'join_code_unknown', 'No circle has this code; check it with your host', { code: 'is not a current join code' });
    if (!code) throw refused;
    const [circle] = (await this.dataSource.query('SELECT id FROM circles WHERE join_code = $1', [code])) as { id: string }[];
    if (!circle) throw refused;
    await addMember(this.dataSource.manager, circle.id, userId);
    return { id: circle.id };
  }

  /** A new join code; the old one stops working at once. */
  async rotateJoinCode(circleId: string, userId: string): Promise<{ joinCode: string }> {
    return this.dataSource.transaction(async (manager) => {
      if ((await roleIn(manager, circleId, userId)) !== 'host') throw new AppError(403, 'not_a_host', 'Only a host can change the join code');
      const joinCode = newJoinCode();
      await manager.query('UPDATE circles SET join_code = $2 WHERE id = $1', [circleId, joinCode]);
      return { joinCode };
    });
  }

  async remove(circleId: string, actorId: string, targetId: string): Promise<void> {
    await this.changeMembers(
      circleId,
      actorId,
      (actor, members) => removeRefusal(actor, targetId, members),
      async (manager) => {
        await manager.query('DELETE FROM circle_members WHERE circle_id = $1 AND user_id = $2', [circleId, targetId]);
      },
    );
  }

  /** Makes `targetId` a host; the actor stays a host only when `stayHost`. */
  async handOver(circleId: string, actorId: string, targetId: string, stayHost: boolean): Promise<void> {
    await this.changeMembers(
      circleId,
      actorId,
      (actor, members) => handOverRefusal(actor, targetId, members),
      async (manager) => {
        await manager.query(`UPDATE circle_members SET role = 'host' WHERE circle_id = $1 AND user_id = $2`, [circleId, targetId]);
        if (!stayHost) await manager.query(`UPDATE circle_members SET role = 'member' WHERE circle_id = $1 AND user_id = $2`, [circleId, actorId]);
      },
    );
  }

  /** Leaves at once; the last reader to leave closes the circle (its rows go with it). */
  async leave(circleId: string, userId: string): Promise<void> {
    await this.changeMembers(
      circleId,
      userId,
      (actor, members) => leaveRefusal(actor, members),
      async (manager, members) => {
        if (members.length === 1) await manager.query('DELETE FROM circles WHERE id = $1', [circleId]);
        else await manager.query('DELETE FROM circle_members WHERE circle_id = $1 AND user_id = $2', [circleId, userId]);
      },
    );
  }

  /** Runs a membership change under the circle's lock (the one pushes take), after the shared rule allows it. */
  private async changeMembers(
    circleId: string,
    actorId: string,
    refusal: (actor: Membership | undefined, members: Membership[]) => string | null,
    work: (manager: EntityManager, members: Membership[]) => Promise<void>,
  ): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      await manager.query(`SELECT pg_advisory_xact_lock(hashtextextended('circle:' || $1, 0))`, [circleId]);
      const members = asMemberships(await membersOf(manager, circleId));
      const actor = members.find((member) => member.userId === actorId);
      if (!actor) throw notAMember();
      const reason = refusal(actor, members);
      if (reason) throw new AppError(409, 'membership_refused', reason);
      await work(manager, members);
    });
  }
}

/** Adds a reader as a member (a no-op for someone already in the circle). */
export async function addMember(manager: Pick<EntityManager, 'query'>, circleId: string, userId: string): Promise<void> {
  await manager.query(`INSERT INTO circle_members (circle_id, user_id, role) VALUES ($1, $2, 'member') ON CONFLICT DO NOTHING`, [circleId, userId]);
}
