import type { DataSource } from 'typeorm';

import { hashPassword } from '../domain/passwords';
import { seedDemoLibrary } from './seed-demo-library';
import { seedDemoCircle } from './demo-circle';
import { User, type Role } from '../data-access/entities/user.entity';

/** The invented demo accounts `npm start` creates. Names and addresses are made up. */
export const DEMO_ACCOUNTS: readonly { email: string; password: string; displayName: string; role: Role; withLibrary: boolean }[] = [
  { email: 'wren@example.com', password: 'lamplight-demo-reader', displayName: 'Wren Ashdown', role: 'reader', withLibrary: true },
  { email: 'oren@example.com', password: 'lamplight-demo-admin', displayName: 'Oren Pike', role: 'admin', withLibrary: false },
];

/**
 * Creates the demo accounts when missing and gives the demo reader the invented library when
 * they have no books yet; running it again changes nothing. Answers how many books it added.
 */
export async function seedDemo(dataSource: DataSource, bcryptCost: number): Promise<{ demoBooksAdded: number }> {
  const users = dataSource.getRepository(User);
  let demoBooksAdded = 0;
  for (const account of DEMO_ACCOUNTS) {
    if (!(await users.existsBy({ email: account.email }))) {
      await users.insert({
        email: account.email,
        displayName: account.displayName,
        role: account.role,
        passwordHash: await hashPassword(account.password, bcryptCost),
      });
    }
    if (account.withLibrary) {
      const user = await users.findOneByOrFail({ email: account.email });
      demoBooksAdded += (await seedDemoLibrary(dataSource, user.id))?.books ?? 0;
    }
  }
  const [host, member] = await Promise.all(DEMO_ACCOUNTS.map((account) => users.findOneByOrFail({ email: account.email })));
  await seedDemoCircle(dataSource, host!.id, member?.id ?? null);
  return { demoBooksAdded };
}
