import type { ChangeProblem, FieldChange, PullResponse } from '../../shared/sync/field-change';
import { restampClocks } from '../../shared/sync/device-clock';
import { HlcClock } from '../../shared/sync/hlc';
import { applyPulled, emptyRow, type LocalRow } from '../../shared/sync/local-row';
import { runSyncCycle, type PushOutcome, type QueuedChange, type SyncPorts } from '../../shared/sync/sync-cycle';
import type { SimRequest, SimResponse } from './sim-wire';

/** A write a device made, remembered by the checks. */
export interface WriteRecord {
  readonly device: string;
  readonly change: FieldChange;
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
}

/**
 * A simulated device: its rows, outbox and cursor in "durable" memory, its hybrid logical clock
 * over a physical clock with its own skew, and the real shared sync cycle (`runSyncCycle`) and
 * merge (`applyPulled`) over a transport that may lose, delay or repeat anything. A crash throws
 * away everything but the durable state, including a cycle half way through.
 */
export class SimDevice {
  readonly durable: DurableState = { rows: new Map(), outbox: [], cursor: undefined, lastClock: null, setAside: [], nextSeq: 0 };
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
    private readonly options: { batchSize: number; pullLimit: number },
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
    return new HlcClock(this.node, () => this.now() + this.skewMs, this.durable.lastClock);
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
    const send = async (request: SimRequest) => {
      alive();
      const response = await this.transport(this, request);
      alive();
      return response;
    };
    return {
      nextBatch: async (limit) => (alive(), durable.outbox.slice(0, limit)),
      acknowledge: async (changes) => {
        alive();
        const done = new Set(changes.map((c) => c.seq));
        durable.outbox = durable.outbox.filter((c) => !done.has(c.seq));
        for (const change of changes) this.acknowledged.add(change.id);
      },
      // As the app does after `clock_ahead`: new clocks in the same order, on the outbox and the rows.
      restamp: async (changes) => {
        alive();
        const renamed = restampClocks(
          changes.map((c) => c.hlc),
          this.node,
          () => this.now() + this.skewMs,
          durable.lastClock,
        );
        durable.outbox = durable.outbox.map((c) => ({ ...c, hlc: renamed.get(c.hlc) ?? c.hlc }));
        for (const [key, row] of durable.rows) {
          const clocks = Object.fromEntries(Object.entries(row._hlc).map(([field, hlc]) => [field, renamed.get(hlc) ?? hlc]));
          durable.rows.set(key, { ...row, _hlc: clocks });
        }
        durable.lastClock = [...renamed.values()].at(-1) ?? durable.lastClock;
        this.clock = this.restoreClock();
      },
      setAside: async (refused) => {
        alive();
        durable.setAside.push(...refused);
        const done = new Set(refused.map((r) => r.change.seq));
        durable.outbox = durable.outbox.filter((c) => !done.has(c.seq));
      },
      push: async (changes): Promise<PushOutcome> => {
        const res = await send({ kind: 'push', body: { deviceId: this.node, changes } });
        if (res.status === 200) return { kind: 'applied' };
        if (res.status === 413) return { kind: 'too-large' };
        if (res.status === 400 && Array.isArray(res.body?.error?.details)) return { kind: 'refused', problems: res.body.error.details };
        throw new Error(`push answered ${res.status}: ${JSON.stringify(res.body)}`);
      },
      cursor: async () => (alive(), durable.cursor),
      pull: async (cursor): Promise<PullResponse> => {
        const res = await send({ kind: 'pull', since: cursor, limit: this.options.pullLimit });
        if (res.status !== 200) throw new Error(`pull answered ${res.status}: ${JSON.stringify(res.body)}`);
        return res.body as PullResponse;
      },
      apply: async (page) => {
        alive();
        for (const change of page.changes) {
          const key = `${change.collection}/${change.rowId}`;
          durable.rows.set(key, applyPulled(durable.rows.get(key) ?? emptyRow(change.rowId), [change]));
          this.clock.receive(change.hlc);
        }
        durable.lastClock = this.clock.current();
        durable.cursor = page.cursor;
      },
    };
  }
}
