import { queryableOf, TextStore } from '../data-access/text-store';
import type { Job } from './job';

/** Text history keeps 30 days: older versions go once a day (04:10 UTC). */
export const pruneTextVersions: Job = {
  name: 'prune-text-versions',
  cron: '10 4 * * *',
  async run({ dataSource }) {
    await TextStore.pruneVersions(queryableOf(dataSource));
  },
};
