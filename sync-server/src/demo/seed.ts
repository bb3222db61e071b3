import { loadConfig } from '../config';
import { createDataSource } from '../data-access/data-source';
import { migrate } from '../data-access/migrate';
import { DEMO_ACCOUNTS, seedDemo } from './seed-demo';
import { closePasswordPools } from '../domain/passwords';

/** `node dist/node/sync-server/src/demo/seed.js`: migrate, then add the demo accounts and library (idempotent). */
async function seed(): Promise<void> {
  const config = loadConfig();
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  let demoBooksAdded = 0;
  try {
    await migrate(dataSource);
    ({ demoBooksAdded } = await seedDemo(dataSource, config.bcryptCost));
  } finally {
    await Promise.allSettled([dataSource.destroy(), closePasswordPools()]);
  }
  for (const account of DEMO_ACCOUNTS) {
    console.log(`  ${account.role.padEnd(6)}  ${account.email}  password: ${account.password}`);
  }
  if (demoBooksAdded > 0) console.log(`  (the reader's demo library: ${demoBooksAdded} invented books added)`);
}

seed().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
