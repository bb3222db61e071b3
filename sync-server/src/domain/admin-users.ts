import type { DataSource } from 'typeorm';

import type { AdminUserPage, AdminUserView } from '../../../shared/api/admin';
import { AppError } from '../errors';
import { User, type Role } from '../data-access/entities/user.entity';
import { storedBytesByUser } from '../data-access/user-data-size';
import { forgetUser } from './session-checks';

/** What admins may see and change about accounts. Journals themselves stay private. */
export class AdminUsers {
  constructor(private readonly dataSource: DataSource) {}

  /**
   * One page of accounts, oldest first, whose email or name contains `q` (any case); counted and
   * paged in PostgreSQL, so ten thousand accounts cost what one page does.
   */
  async page(q: string, page: number, size: number): Promise<AdminUserPage> {
    const query = this.dataSource.getRepository(User).createQueryBuilder('u');
    if (q) {
      // LIKE's own wildcards in the search are meant literally.
      const pattern = `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
      query.where('(u.email ILIKE :pattern OR u.displayName ILIKE :pattern)', { pattern });
    }
    const [users, total] = await query
      .orderBy('u.createdAt', 'ASC')
      .addOrderBy('u.id', 'ASC')
      .skip(page * size)
      .take(size)
      .getManyAndCount();
    return { accounts: await this.views(users), total, page, size };
  }

  private async views(users: readonly User[]): Promise<AdminUserView[]> {
    const sizes = await storedBytesByUser(
      this.dataSource,
      users.map((user) => user.id),
    );
    return users.map((user) => ({
      id: user.id,
      email: user.email,
      displayName: user.displayName,
      role: user.role,
      createdAt: user.createdAt.toISOString(),
      lastSeenAt: user.lastSeenAt?.toISOString() ?? null,
      disabled: user.disabledAt !== null,
      storedBytes: sizes.get(user.id) ?? 0,
    }));
  }

  /**
   * Disables/enables an account or grants/removes admin. An admin cannot lock themselves out,
   * so there is always someone left who can undo a mistake.
   */
  async update(actingAdminId: string, userId: string, change: { disabled?: boolean; role?: Role }): Promise<AdminUserView> {
    if (userId === actingAdminId && (change.disabled === true || change.role === 'reader')) {
      throw new AppError(400, 'invalid_input', 'You cannot disable your own account or remove your own admin role', {
        [change.disabled === true ? 'disabled' : 'role']: 'You cannot change this on your own account',
      });
    }
    const users = this.dataSource.getRepository(User);
    const user = await users.findOneBy({ id: userId });
    if (!user) throw new AppError(404, 'not_found', 'No such account');
    await this.dataSource.transaction(async (manager) => {
      if (change.role) await manager.update(User, { id: userId }, { role: change.role });
      if (change.disabled !== undefined) {
        await manager.update(User, { id: userId }, { disabledAt: change.disabled ? (user.disabledAt ?? new Date()) : null });
      }
    });
    forgetUser(userId);
    const updated = await users.findOneBy({ id: userId });
    if (!updated) throw new AppError(404, 'not_found', 'No such account');
    return (await this.views([updated]))[0]!;
  }
}
