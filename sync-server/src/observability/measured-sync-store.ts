import type { FieldChange } from '../../../shared/api/sync';
import { parseHlc } from '../../../shared/sync/hlc';
import { SyncStore } from '../data-access/sync-store';
import { mergeDuration, outboxLag, pullChanges, pushChanges, pushOutcome } from './metrics';

/** The sync store, reporting push and pull sizes, merge time and outbox lag to the metrics. */
export class MeasuredSyncStore extends SyncStore {
  override async push(userId: string, changes: readonly FieldChange[]): ReturnType<SyncStore['push']> {
    const started = process.hrtime.bigint();
    const result = await super.push(userId, changes);
    const now = Date.now();
    mergeDuration.observe(Number(process.hrtime.bigint() - started) / 1e9);
    pushChanges.observe(changes.length);
    pushOutcome.inc({ outcome: 'applied' }, result.applied);
    pushOutcome.inc({ outcome: 'duplicate' }, result.duplicates);
    pushOutcome.inc({ outcome: 'superseded' }, result.superseded);
    // The oldest change of a push is how long the device's outbox held it (clocks carry wall time).
    const oldest = Math.min(...changes.map((change) => parseHlc(change.hlc)?.wall ?? now));
    if (changes.length > 0) outboxLag.observe(Math.max(0, now - oldest) / 1000);
    return result;
  }

  override async pull(...args: Parameters<SyncStore['pull']>): ReturnType<SyncStore['pull']> {
    const page = await super.pull(...args);
    pullChanges.observe(page.changes.length);
    return page;
  }
}
