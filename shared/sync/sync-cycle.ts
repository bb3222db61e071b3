import type { ChangeProblem, FieldChange, PullResponse } from '../api/sync';
import { MAX_PUSH_CHANGES } from '../api/sync';

/** An outbox entry as the cycle sees it: a change plus its local order. */
export type QueuedChange = FieldChange & { readonly seq?: number };

/** What a push came back with, once HTTP is taken out of it. */
export type PushOutcome = { readonly kind: 'applied' } | { readonly kind: 'refused'; readonly problems: readonly ChangeProblem[] } | { readonly kind: 'too-large' };

/**
 * What a device provides for one sync: its outbox, its local rows and its connection. Network
 * failures, 401s and server errors are thrown and end the cycle; the caller retries later and
 * nothing is lost, because entries leave the outbox only after the server confirmed them.
 */
export interface SyncPorts {
  /** The oldest `limit` changes of the outbox, in write order. */
  nextBatch(limit: number): Promise<readonly QueuedChange[]>;
  /** The server has them: drop them from the outbox. */
  acknowledge(changes: readonly QueuedChange[]): Promise<void>;
  /**
   * The server found their clocks ahead of its own (this device's date is wrong): stamp them
   * again from the corrected time, keeping their order, and keep them in the outbox.
   */
  restamp(changes: readonly QueuedChange[]): Promise<void>;
  /** The server refused them for good: move them aside with the reason, out of the outbox. */
  setAside(refused: readonly { change: QueuedChange; problem: ChangeProblem }[]): Promise<void>;
  push(changes: readonly FieldChange[]): Promise<PushOutcome>;
  cursor(): Promise<string | undefined>;
  pull(cursor: string | undefined): Promise<PullResponse>;
  /** Merges a pulled page into local rows and keeps its cursor, together. */
  apply(page: PullResponse): Promise<void>;
}

export interface CycleReport {
  readonly pushed: number;
  readonly refused: number;
  readonly pulled: number;
}

/**
 * One sync: push the outbox in batches until it is empty, then pull from the last cursor until
 * there is no more. Refused changes are set aside (and the rest of their batch re-sent), except
 * clocks ahead of the server's, which are stamped again and re-sent; a batch the server finds
 * too large, or refuses without naming a change, is halved; one such change alone is set aside.
 */
/** How far a pull has come: rows pulled in this cycle, and about how many in all (null when one page did it). */
export interface PullProgress {
  readonly rows: number;
  readonly aboutTotal: number | null;
}

export interface CycleOptions {
  /** Push batches of at most this many changes. */
  readonly batchSize?: number;
  /** Fetch the next pull page while the current one is applied (the network and the store work together). */
  readonly prefetch?: boolean;
  /** Told after each applied pull page. */
  readonly onPulled?: (progress: PullProgress) => void;
}

export async function runSyncCycle(ports: SyncPorts, options: CycleOptions | number = {}): Promise<CycleReport> {
  const { batchSize = 500, prefetch = false, onPulled } = typeof options === 'number' ? { batchSize: options } : options;
  let size = Math.min(batchSize, MAX_PUSH_CHANGES);
  let pushed = 0;
  let refused = 0;
  let restamps = 0;
  for (;;) {
    const batch = await ports.nextBatch(size);
    if (batch.length === 0) break;
    const outcome = await ports.push(batch.map(({ seq: _seq, ...change }) => change));
    if (outcome.kind === 'applied') {
      await ports.acknowledge(batch);
      pushed += batch.length;
    } else if (outcome.kind === 'refused' && outcome.problems.length === 0 && batch.length > 1) {
      // Refused without saying which change (the database's own check): halve to find it.
      size = Math.max(1, Math.floor(batch.length / 2));
    } else if (outcome.kind === 'refused' && outcome.problems.length === 0) {
      await ports.setAside([{ change: batch[0]!, problem: { index: 0, code: 'unstorable', reason: 'The server cannot store this change' } }]);
      refused++;
    } else if (outcome.kind === 'refused' && outcome.problems.some((p) => p.code === 'clock_ahead' && batch[p.index])) {
      // Never set aside for a clock problem: stamp again from the server's time and push again.
      if (++restamps > 3) throw new Error("This device's clock could not be brought in line with the server; trying again later");
      await ports.restamp(outcome.problems.filter((p) => p.code === 'clock_ahead' && batch[p.index]).map((p) => batch[p.index]!));
    } else if (outcome.kind === 'refused') {
      const setAside = outcome.problems.filter((p) => batch[p.index]).map((problem) => ({ change: batch[problem.index]!, problem }));
      if (setAside.length === 0) throw new Error('The server refused a batch without saying which change');
      await ports.setAside(setAside);
      refused += setAside.length;
    } else if (batch.length > 1) {
      size = Math.max(1, Math.floor(batch.length / 2));
    } else {
      await ports.setAside([{ change: batch[0]!, problem: { index: 0, code: 'too_large', reason: 'This change is too large to sync' } }]);
      refused++;
    }
  }
  const { pulled } = await pullAll(ports, prefetch, onPulled);
  return { pushed, refused, pulled };
}

/** With prefetch, at most this many pages are fetched (or on their way) and not yet stored. */
const PAGES_AHEAD = 2;

/**
 * Pulls from the stored cursor until there is no more, storing each page in order. With
 * `prefetch`, each page is asked for as soon as the one before it arrives (up to
 * {@link PAGES_AHEAD} waiting), so the network does not wait for the store nor the store for it.
 */
async function pullAll(ports: SyncPorts, prefetch: boolean, onPulled?: (progress: PullProgress) => void): Promise<{ pulled: number }> {
  const waiting: Promise<PullResponse>[] = [];
  /** The cursor of an arrived page whose next page is not asked for yet (too many waiting). */
  let parked: string | null = null;
  const fetch = (cursor: string | undefined) => {
    const request = ports.pull(cursor);
    request.catch(() => undefined); // a failed prefetch surfaces when it is awaited, not as an unhandled rejection
    waiting.push(request);
    if (!prefetch) return;
    request.then(
      (page) => {
        if (!page.hasMore) return;
        if (waiting.length < PAGES_AHEAD) fetch(page.cursor);
        else parked = page.cursor;
      },
      () => undefined,
    );
  };
  fetch(await ports.cursor());
  let pulled = 0;
  let rows = 0;
  for (;;) {
    const page = await waiting[0]!;
    waiting.shift();
    if (parked !== null) {
      const cursor: string = parked;
      parked = null;
      fetch(cursor);
    }
    await ports.apply(page);
    pulled += page.changes.length;
    rows += new Set(page.changes.map((change) => `${change.collection}/${change.rowId}`)).size;
    onPulled?.({ rows, aboutTotal: page.hasMore && page.remaining !== undefined ? rows + page.remaining : page.hasMore ? null : rows });
    if (!page.hasMore) return { pulled };
    if (!prefetch) fetch(page.cursor);
  }
}

/**
 * How long to wait before retry `attempt` (0-based): exponential backoff from 1 s, capped at a
 * minute, with "equal jitter" so many devices coming back online do not retry in step
 * (common practice, as in the AWS Architecture Blog's "Exponential Backoff and Jitter").
 */
export function retryDelayMs(attempt: number, random: () => number = Math.random): number {
  const ceiling = Math.min(60_000, 1000 * 2 ** Math.max(0, attempt));
  return Math.round(ceiling / 2 + random() * (ceiling / 2));
}
