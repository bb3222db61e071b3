import { queryableOf } from '../data-access/text-store';
import { purgeTombstones } from '../data-access/tombstone-purge';
import { atMost, type Job } from './job';

/** Rounds of at most 1,000 rows per table a run does; a run that stops short finishes next day. */
const ROUNDS = 50;

/**
 * Trash keeps deleted things 30 days; after that the server forgets what they said (daily,
 * 03:40 UTC), keeping ids and clocks so a late device cannot bring them back.
 */
export const purgeTombstonesJob: Job = {
  name: 'purge-tombstones',
  cron: '40 3 * * *',
  async run({ dataSource }) {
    const db = queryableOf(dataSource);
    await atMost(ROUNDS, async () => (await purgeTombstones(db, Date.now())) > 0);
  },
};
