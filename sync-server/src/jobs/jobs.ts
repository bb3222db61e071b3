import { compactTexts } from './compact-texts.job';
import type { Job } from './job';
import { loanReminders } from './loan-reminders.job';
import { pruneTextVersions } from './prune-text-versions.job';
import { purgeTombstonesJob } from './purge-tombstones.job';

/** Every background job the server runs. To add one: write `NAME.job.ts` and list it here. */
export const JOBS: readonly Job[] = [compactTexts, pruneTextVersions, purgeTombstonesJob, loanReminders];
