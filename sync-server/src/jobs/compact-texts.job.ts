import { TextStore, transactionalOf } from '../data-access/text-store';
import { atMost, type Job } from './job';

/** A text is compacted once nobody has written to it for this long. */
const QUIET_SECONDS = 30;
/** At most this many texts a run, so a run stays short; the next minute takes the rest. */
const PER_RUN = 500;

/**
 * Drops deleted characters from mergeable texts' stored states (see TextStore.compactOne), so
 * a fresh device pulls a compact state rather than the merged history of every edit.
 */
export const compactTexts: Job = {
  name: 'compact-texts',
  cron: '* * * * *',
  async run({ dataSource }) {
    const db = transactionalOf(dataSource);
    await atMost(PER_RUN, () => TextStore.compactOne(db, QUIET_SECONDS));
  },
};
