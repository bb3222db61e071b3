import type { ChangeProblem, FieldChange, PullResponse } from '../../shared/api/sync';
import { clockOffsetMs, restampClocks, restampFloor } from '../../shared/sync/device-clock';
import { HlcClock } from '../../shared/sync/hlc';
import { applyPulled, emptyRow, type LocalRow } from '../../shared/sync/local-row';
import { currentSetState, mergeSetField } from '../../shared/sync/merge-set';
import { isEmptyOrSet, orSetClocks, orSetDelta, orSetElements, renameOrSetClocks, type OrSetState } from '../../shared/sync/or-set';
import { fieldSpecOf } from '../../shared/sync/schema/collections';
import { runSyncCycle, type PushOutcome, type QueuedChange, type SyncPorts } from '../../shared/sync/sync-cycle';
import type { SimRequest, SimResponse } from './sim-wire';

/** A write a device made, remembered by the checks. */
export interface WriteRecord {
  readonly device: string;
  /** As last pushed: a re-stamp after `clock_ahead` gives it new clocks. */
  change: FieldChange;
  /** A change the server must refuse (a real validation error), injected on purpose. */
  readonly invalid: boolean;
}

/** Thrown into a cycle whose device crashed, and by the network for a lost request or answer. */
export class NetworkError extends Error {
  override readonly name = 'NetworkError';
}

/** What survives a crash: the device's IndexedDB, in the app. */
interface DurableState {
  rows: Map<string, LocalRow>;
  outbox: QueuedChange[];
  cursor: string | undefined;
  /** The last clock issued or seen, stored so clocks stay monotonic across restarts. */
  lastClock: string | null;
  setAside: { change: QueuedChange; problem: ChangeProblem }[];
  nextSeq: number;
  /** Learnt from the server's time (`meta.clockOffset` in the app): added to the device's own clock. */
  clockOffset: number;
  /** The greatest clock pulled from the server (`meta.seenClock`): re-stamps start after it. */
  seenClock: string | null;
  /** The greatest own clock the server took, or a re-stamp gave: the next re-stamp starts after it, so no clock is issued twice or goes back. */
  restamped: string | null;
}

/** How a device meets `clock_ahead`: as the app does, or as a broken app would (for the spec that shows the check bites). */
export type ClockAheadHandling = 'restamp' | 'set-aside';

/**
 * A simulated device: its rows, outbox and cursor in "durable" memory, its hybrid logical clock
 * over a physical clock with its own skew, and the real shared sync cycle (`runSyncCycle`) and
 * merge (`applyPulled`) over a transport that may lose, delay or repeat anything. A crash throws
 * away everything but the durable state, including a cycle half way through.
 */
export class SimDevice {
  readonly durable: DurableState = {
    rows: new Map(),
    outbox: [],
    cursor: undefined,
    lastClock: null,
    setAside: [],
    nextSeq: 0,
    clockOffset: 0,
    seenClock: null,
    restamped: null,
  };
  readonly writes: WriteRecord[] = [];
  /** Ids of changes the server confirmed to this device (acknowledged writes). */
  readonly acknowledged = new Set<string>();
  /** Errors a cycle ended with that no network fault explains (a 5xx, a refusal without details…). */
  readonly unexpected: string[] = [];
  skewMs = 0;
  /** Whether the last cycle that ended ran to its end (pushed everything, pulled to the last page). */
  lastCycleOk = false;
  private epoch = 0;
  private clock: HlcClock;
  private cycle: Promise<void> | null = null;

  constructor(
    readonly node: string,
    private readonly now: () => number,
    private readonly transport: (device: SimDevice, request: SimRequest) => Promise<SimResponse>,
    private readonly newId: () => string,
    private readonly options: { batchSize: number; pullLimit: number; clockAhead?: ClockAheadHandling },
  ) {
    this.clock = this.restoreClock();
  }

  get syncing(): boolean {
    return this.cycle !== null;
  }

  /** A local edit: row, clock and outbox change together (one IndexedDB transaction in the app). */
  write(collection: string, rowId: string, field: string, value: unknown): void {
    const change: FieldChange = { id: this.newId(), collection, rowId, field, value, hlc: this.tick() };
    const key = `${collection}/${rowId}`;
    const row = this.durable.rows.get(key) ?? emptyRow(rowId);
    this.durable.rows.set(key, { ...row, [field]: value, _hlc: { ...row._hlc, [field]: change.hlc } });
    this.durable.outbox.push({ ...change, seq: ++this.durable.nextSeq });
    this.writes.push({ device: this.node, change, invalid: false });
  }

  /**
   * A set field's edit, as `JournalStore.write` makes it: the delta (`orSetDelta`) from the row's
   * current state to `next`, joined into the row, pushed as the change's value. No change when
   * nothing differs.
   */
  writeSet(collection: string, rowId: string, field: string, edit: (elements: string[]) => string[]): void {
    const key = `${collection}/${rowId}`;
    const row = this.durable.rows.get(key) ?? emptyRow(rowId);
    const current = { value: row[field], hlc: row._hlc[field], state: row._sets?.[field] };
    const hlc = this.tick();
    const delta = orSetDelta(currentSetState(current), edit(orSetElements(currentSetState(current))), hlc);
    if (isEmptyOrSet(delta)) return;
    const merged = mergeSetField(current, { value: delta, hlc });
    this.durable.rows.set(key, { ...row, [field]: merged.value, _hlc: { ...row._hlc, [field]: hlc }, _sets: { ...row._sets, [field]: merged.state } });
    const change: FieldChange = { id: this.newId(), collection, rowId, field, value: delta, hlc };
    this.durable.outbox.push({ ...change, seq: ++this.durable.nextSeq });
    this.writes.push({ device: this.node, change, invalid: false });
  }

  /** A change the server will refuse (as from an app version with other rules); the row is untouched. */
  writeInvalid(collection: string, rowId: string, field: string, value: unknown): void {
    const change: FieldChange = { id: this.newId(), collection, rowId, field, value, hlc: this.tick() };
    this.durable.outbox.push({ ...change, seq: ++this.durable.nextSeq });
    this.writes.push({ device: this.node, change, invalid: true });
  }

  /** Starts a sync cycle unless one is running; it runs as far as the network lets it. */
  startSync(): void {
    if (this.cycle) return;
    const epoch = this.epoch;
    const cycle = runSyncCycle(this.ports(epoch), this.options.batchSize).then(
      () => void (this.lastCycleOk = true),
      (error: unknown) => {
        this.lastCycleOk = false;
        if (!(error instanceof NetworkError)) this.unexpected.push(error instanceof Error ? error.message : String(error));
      },
    );
    this.cycle = cycle.finally(() => {
      if (this.epoch === epoch) this.cycle = null;
    });
  }

  /** Waits for the running cycle, if any, to end. */
  async settle(): Promise<void> {
    await this.cycle;
  }

  /** The process dies: the running cycle is abandoned, the clock restarts from storage. */
  crash(): void {
    this.epoch++;
    this.cycle = null;
    this.clock = this.restoreClock();
  }

  /** The device's epoch, so the network can tell answers meant for a crashed process. */
  get currentEpoch(): number {
    return this.epoch;
  }

  private restoreClock(): HlcClock {
    return new HlcClock(this.node, () => this.deviceNow(), this.durable.lastClock);
  }

  /** The device's own clock (`Date.now()` in the app), off by its skew. */
  private rawNow(): number {
    return this.now() + this.skewMs;
  }

  /** The device's idea of the time: its own clock corrected by the offset it learnt. */
  private deviceNow(): number {
    return this.rawNow() + this.durable.clockOffset;
  }

  private tick(): string {
    const hlc = this.clock.tick();
    this.durable.lastClock = hlc;
    return hlc;
  }

  /** The cycle's ports, dead once the device crashes (a dead process touches nothing). */
  private ports(epoch: number): SyncPorts {
    const alive = () => {
      if (this.epoch !== epoch) throw new NetworkError('the device crashed');
    };
    const durable = this.durable;
    let sentAt = 0;
    const send = async (request: SimRequest) => {
      alive();
      sentAt = this.rawNow();
      const response = await this.transport(this, request);
      alive();
      return response;
    };
    // As DexieSyncPorts.learnTime: the answer's `serverTime`, else its Date header, against the middle of the request.
    const learnTime = (res: SimResponse) => {
      const server = typeof res.body?.serverTime === 'string' ? Date.parse(res.body.serverTime) : (res.dateMs ?? NaN);
      if (Number.isFinite(server)) durable.clockOffset = clockOffsetMs(server, sentAt, this.rawNow());
    };
    return {
      nextBatch: async (limit) => (alive(), durable.outbox.slice(0, limit)),
      acknowledge: async (changes) => {
        alive();
        const done = new Set(changes.map((c) => c.seq));
        durable.outbox = durable.outbox.filter((c) => !done.has(c.seq));
        for (const change of changes) this.acknowledged.add(change.id);
        for (const change of changes) if (!durable.restamped || change.hlc > durable.restamped) durable.restamped = change.hlc;
      },
      // As DexieSyncPorts.restamp: new clocks in outbox order from the corrected time, after `restampFloor`;
      // the outbox and rows follow. A set delta carries its own clock inside: renamed with it.
      restamp: async (changes) => {
        alive();
        if (this.options.clockAhead === 'set-aside') {
          return this.setAsidePort(changes.map((change, index) => ({ change, problem: { index, code: 'clock_ahead', reason: 'set aside' } })));
        }
        // The refused changes and every later one of the outbox (written after them, so no less ahead), in one go.
        const from = changes.reduce((min, c) => (c.hlc < min ? c.hlc : min), changes[0]!.hlc);
        const ordered = durable.outbox.filter((c) => c.hlc >= from);
        // After everything seen from others, the last re-stamp, and every clock the device keeps that is not re-stamped (its
        // own earlier writes, the adds a delta removes): else a remove could precede the add it removes, or a new write an old one.
        const kept = [
          ...durable.outbox.flatMap((c) => [c.hlc, ...(isSet(c) ? orSetClocks(c.value as OrSetState) : [])]),
          ...[...durable.rows.values()].flatMap((row) => [...Object.values(row._hlc), ...Object.values(row._sets ?? {}).flatMap(orSetClocks)]),
        ];
        const renamed = restampClocks(
          ordered.map((c) => c.hlc),
          this.node,
          () => this.deviceNow(),
          restampFloor(from, durable.seenClock, [durable.restamped, ...kept]),
        );
        durable.restamped = [...renamed.values()].at(-1) ?? durable.restamped;
        const rename = (hlc: string) => renamed.get(hlc) ?? hlc;
        durable.outbox = durable.outbox.map((c) => ({ ...c, hlc: rename(c.hlc), value: isSet(c) ? renameOrSetClocks(c.value as OrSetState, rename) : c.value }));
        for (const [key, row] of durable.rows) {
          const clocks = Object.fromEntries(Object.entries(row._hlc).map(([field, hlc]) => [field, rename(hlc)]));
          const sets = row._sets && Object.fromEntries(Object.entries(row._sets).map(([field, state]) => [field, renameOrSetClocks(state, rename)]));
          durable.rows.set(key, { ...row, _hlc: clocks, ...(sets ? { _sets: sets } : {}) });
        }
        for (const write of this.writes) {
          const queued = durable.outbox.find((c) => c.id === write.change.id);
          if (queued)
            write.change = { id: queued.id, collection: queued.collection, rowId: queued.rowId, field: queued.field, value: queued.value, hlc: queued.hlc };
        }
        durable.lastClock = [...renamed.values()].at(-1) ?? durable.lastClock;
        this.clock = this.restoreClock();
      },
      setAside: async (refused) => (alive(), this.setAsidePort(refused)),
      push: async (changes): Promise<PushOutcome> => {
        const res = await send({ kind: 'push', body: { deviceId: this.node, changes } });
        learnTime(res);
        if (res.status === 200) return { kind: 'applied' };
        if (res.status === 413) return { kind: 'too-large' };
        if (res.status === 400 && Array.isArray(res.body?.error?.details)) return { kind: 'refused', problems: res.body.error.details };
        throw new Error(`push answered ${res.status}: ${JSON.stringify(res.body)}`);
      },
      cursor: async () => (alive(), durable.cursor),
      pull: async (cursor): Promise<PullResponse> => {
        const res = await send({ kind: 'pull', since: cursor, limit: this.options.pullLimit });
        learnTime(res);
        if (res.status !== 200) throw new Error(`pull answered ${res.status}: ${JSON.stringify(res.body)}`);
        return res.body as PullResponse;
      },
      apply: async (page) => {
        alive();
        for (const change of page.changes) {
          const key = `${change.collection}/${change.rowId}`;
          durable.rows.set(key, applyPulled(durable.rows.get(key) ?? emptyRow(change.rowId), [change]));
        }
        // As DexieSyncPorts.adoptClocks: remember the greatest clock and adopt it (the server bounded it by its own time).
        const latest = page.changes.reduce<string | null>((max, change) => (max === null || change.hlc > max ? change.hlc : max), null);
        if (latest && (!durable.seenClock || latest > durable.seenClock)) durable.seenClock = latest;
        if (latest) this.clock.receive(latest, { checkedByServer: true });
        durable.lastClock = this.clock.current();
        durable.cursor = page.cursor;
      },
    };
  }

  private setAsidePort(refused: readonly { change: QueuedChange; problem: ChangeProblem }[]): void {
    this.durable.setAside.push(...refused);
    const done = new Set(refused.map((r) => r.change.seq));
    this.durable.outbox = this.durable.outbox.filter((c) => !done.has(c.seq));
  }
}

const isSet = (change: { collection: string; field: string }) => fieldSpecOf(change.collection, change.field)?.kind === 'set';
