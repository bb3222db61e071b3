import type { DataSource } from 'typeorm';

import { hashPassword } from '../domain/passwords';
import { User, type Role } from './entities/user.entity';

/** The invented demo accounts `npm start` creates. Names and addresses are made up. */
export const DEMO_ACCOUNTS: readonly { email: string; password: string; displayName: string; role: Role }[] = [
  { email: 'wren@example.com', password: 'lamplight-demo-reader', displayName: 'Wren Ashdown', role: 'reader' },
  { email: 'oren@example.com', password: 'lamplight-demo-admin', displayName: 'Oren Pike', role: 'admin' },
];

/** Creates the demo accounts when missing; running it again changes nothing. */
export async function seedDemo(dataSource: DataSource, bcryptCost: number): Promise<void> {
  const users = dataSource.getRepository(User);
  for (const account of DEMO_ACCOUNTS) {
    if (await users.existsBy({ email: account.email })) continue;
    await users.insert({
      email: account.email,
      displayName: account.displayName,
      role: account.role,
      passwordHash: await hashPassword(account.password, bcryptCost),
    });
  }
}
