import { isDeepStrictEqual } from 'node:util';

import fc from 'fast-check';

import type { PullResponse } from '../../shared/api/sync';
import { mergeChanges, type FieldState } from '../../shared/sync/merge-changes';
import { BOOK_STATUSES } from '../../shared/sync/schema/collections';
import type { OrSetState } from '../../shared/sync/or-set';
import { fieldSpecOf } from '../../shared/sync/schema/collections';
import { SimDevice, type ClockAheadHandling, type WriteRecord } from './sim-device';
import { SimNetwork, type Fault, type TraceEntry } from './sim-network';
import type { SimServer } from './sim-wire';

const HOUR = 3_600_000;
/** Small jumps: within ±8 h of true time. */
const MAX_SKEW_MS = 8 * HOUR;
/**
 * Wrong dates: a device 2 or 3 days ahead of or behind true time; its pushes are refused as
 * `clock_ahead` until it learns the server's time and re-stamps them. Whole days, far from the
 * 24 h limit, so the minutes between simulated and real time never change a verdict.
 */
const WRONG_DATES = [-72 * HOUR, -50 * HOUR, 50 * HOUR, 72 * HOUR];
/** Mixed-case node ids: clocks must compare the same in JavaScript and in PostgreSQL. */
export const NODES = ['Tablet-A', 'phone-b', 'Laptop-C', 'e-reader-d'];
const ROWS = 3;

/** A field edit the schedule can make: collection, field and a value the schema accepts. */
type Edit = { readonly collection: string; readonly field: string; readonly value: unknown };

/** Invented titles and authors; ordered lists (authors) merge as a whole, last writer wins. */
const editArbitrary: fc.Arbitrary<Edit> = fc.oneof(
  fc
    .constantFrom('The Copper Orchard', 'Nine Lanterns', 'A Map of Small Rivers', 'Salt and Vellum')
    .map((value) => ({ collection: 'books', field: 'title', value })),
  fc.constantFrom(...BOOK_STATUSES).map((value) => ({ collection: 'books', field: 'status', value })),
  fc.option(fc.integer({ min: 1, max: 10 }).map((n) => n / 2)).map((value) => ({ collection: 'books', field: 'rating', value })),
  fc.option(fc.integer({ min: 1, max: 900 })).map((value) => ({ collection: 'books', field: 'pageCount', value })),
  fc.boolean().map((value) => ({ collection: 'books', field: 'deleted', value })),
  fc.subarray(['Ada Quillfeather', 'Tomas Brierly', 'Noor Haddaway']).map((value) => ({ collection: 'books', field: 'authors', value })),
  fc.constantFrom(...BOOK_STATUSES).map((value) => ({ collection: 'bookStatusChanges', field: 'status', value })),
  fc
    .integer({ min: 0, max: 10 ** 6 })
    .map((s) => ({ collection: 'bookStatusChanges', field: 'changedAt', value: new Date(1_780_000_000_000 + s * 1000).toISOString() })),
);

/** Tags a schedule adds and removes: few, so devices often touch the same one. */
const TAGS = ['winter', 'reread', 'gift'];

export type Step =
  | { readonly t: 'write'; readonly d: number; readonly row: number; readonly edit: Edit }
  | { readonly t: 'tag'; readonly d: number; readonly row: number; readonly tag: string; readonly add: boolean }
  | { readonly t: 'invalid'; readonly d: number; readonly row: number }
  | { readonly t: 'sync'; readonly d: number }
  | { readonly t: 'deliver'; readonly k: number; readonly fault: Fault }
  | { readonly t: 'ghost'; readonly k: number }
  | { readonly t: 'crash'; readonly d: number }
  | { readonly t: 'jump'; readonly d: number; readonly skewMs: number }
  | { readonly t: 'tick'; readonly ms: number };

export interface Schedule {
  readonly devices: number;
  readonly batchSize: number;
  readonly pullLimit: number;
  readonly skews: readonly number[];
  readonly steps: readonly Step[];
}

const device = fc.nat(NODES.length - 1);
const skew = fc.oneof({ arbitrary: fc.integer({ min: -MAX_SKEW_MS, max: MAX_SKEW_MS }), weight: 2 }, { arbitrary: fc.constantFrom(...WRONG_DATES), weight: 1 });
const fault = fc.oneof(
  { arbitrary: fc.constant<Fault>('ok'), weight: 6 },
  { arbitrary: fc.constantFrom<Fault>('drop-request', 'drop-response', 'server-crash', 'duplicate', 'delay'), weight: 4 },
);
const step: fc.Arbitrary<Step> = fc.oneof(
  { arbitrary: fc.record({ t: fc.constant('write' as const), d: device, row: fc.nat(ROWS - 1), edit: editArbitrary }), weight: 6 },
  // A book's tags, a set field that merges per element (shared/sync/or-set.ts).
  {
    arbitrary: fc.record({ t: fc.constant('tag' as const), d: device, row: fc.nat(ROWS - 1), tag: fc.constantFrom(...TAGS), add: fc.boolean() }),
    weight: 4,
  },
  { arbitrary: fc.record({ t: fc.constant('invalid' as const), d: device, row: fc.nat(ROWS - 1) }), weight: 1 },
  { arbitrary: fc.record({ t: fc.constant('sync' as const), d: device }), weight: 4 },
  { arbitrary: fc.record({ t: fc.constant('deliver' as const), k: fc.nat(7), fault }), weight: 10 },
  { arbitrary: fc.record({ t: fc.constant('ghost' as const), k: fc.nat(7) }), weight: 1 },
  { arbitrary: fc.record({ t: fc.constant('crash' as const), d: device }), weight: 1 },
  // Clocks jump: forward or back, by hours, or to a date days off.
  { arbitrary: fc.record({ t: fc.constant('jump' as const), d: device, skewMs: skew }), weight: 1 },
  { arbitrary: fc.record({ t: fc.constant('tick' as const), ms: fc.integer({ min: 0, max: 120_000 }) }), weight: 2 },
);

/** Schedules of 2–4 devices, small batches and pages (so paging and splitting happen), up to `maxSteps` steps. */
export const scheduleArbitrary = (maxSteps = 60): fc.Arbitrary<Schedule> =>
  fc.record({
    devices: fc.integer({ min: 2, max: NODES.length }),
    batchSize: fc.integer({ min: 1, max: 4 }),
    pullLimit: fc.integer({ min: 1, max: 5 }),
    skews: fc.array(fc.integer({ min: -HOUR, max: HOUR }), { minLength: NODES.length, maxLength: NODES.length }),
    steps: fc.array(step, { minLength: 1, maxLength: maxSteps, size: 'max' }),
  });

/** What one schedule came to; every count but `writes` and `acknowledged` should be 0. */
export interface Outcome {
  readonly writes: number;
  readonly acknowledged: number;
  /** Devices whose rows differ from the server's after the final sync. */
  readonly divergent: number;
  /** Writes the server confirmed whose field holds neither them nor a write with a greater clock. */
  readonly lostAcknowledged: number;
  /** The same for every valid write, confirmed or not (all are pushed by the final sync). */
  readonly lostWrites: number;
  /** Valid changes a device set aside as refused. */
  readonly refusedValid: number;
  /**
   * Set elements added by an acknowledged write, never removed by a write that had seen that add
   * (an `r` clock at least the add's), yet missing from the server's or some device's final set.
   */
  readonly lostSetAdds: number;
  /** Changes set aside for `clock_ahead` (they must be re-stamped and pushed again, never set aside). */
  readonly setAsideClockAhead: number;
  /** Invalid changes that were not refused. */
  readonly acceptedInvalid: number;
  readonly outboxLeft: number;
  readonly unexpected: readonly string[];
  readonly finalState: FieldState;
  readonly trace: readonly TraceEntry[];
}

const rowId = (collection: string, row: number) => `${collection === 'books' ? 'b0000000' : 'c0000000'}-0000-4000-8000-00000000000${row}`;
const changeId = (n: number) => `00000000-0000-4000-8000-${n.toString(16).padStart(12, '0')}`;
const flush = () => new Promise((resolve) => setImmediate(resolve));

/**
 * Runs one schedule against `server` (a fresh reader's), then a fault-free final sync, and
 * checks it. Deterministic for the in-memory model: no timers, no randomness, one step at a time.
 */
export async function runSchedule(schedule: Schedule, server: SimServer, startMs: number, clockAhead: ClockAheadHandling = 'restamp'): Promise<Outcome> {
  let now = startMs;
  let ids = 0;
  const network = new SimNetwork(server, () => now);
  const options = { batchSize: schedule.batchSize, pullLimit: schedule.pullLimit, clockAhead };
  const devices = NODES.slice(0, schedule.devices).map((node, n) => {
    const device = new SimDevice(
      node,
      () => now,
      (d, request) => network.send(d, request),
      () => changeId(++ids),
      options,
    );
    device.skewMs = schedule.skews[n] ?? 0;
    return device;
  });
  const pick = (d: number) => devices[d % devices.length]!;

  for (const s of schedule.steps) {
    switch (s.t) {
      case 'write':
        pick(s.d).write(s.edit.collection, rowId(s.edit.collection, s.row), s.edit.field, s.edit.value);
        break;
      case 'tag': {
        const { tag, add } = s;
        pick(s.d).writeSet('books', rowId('books', s.row), 'tags', (tags) => (add ? [...tags, tag] : tags.filter((t) => t !== tag)));
        break;
      }
      case 'invalid':
        pick(s.d).writeInvalid('books', rowId('books', s.row), 'rating', 7); // ratings go to 5
        break;
      case 'sync':
        pick(s.d).startSync();
        break;
      case 'deliver':
        await network.deliver(s.k, s.fault);
        break;
      case 'ghost':
        await network.deliverGhost(s.k);
        break;
      case 'crash':
        pick(s.d).crash();
        break;
      case 'jump':
        pick(s.d).skewMs = s.skewMs;
        break;
      case 'tick':
        now += s.ms;
    }
    await flush();
  }

  // The network heals: stragglers arrive, then every device syncs twice (push all, then pull all).
  while (network.ghosts.length > 0) await network.deliverGhost(0);
  network.failAll();
  await flush();
  await Promise.all(devices.map((d) => d.settle()));
  network.auto = true;
  for (let round = 0; round < 2; round++) {
    for (const d of devices) {
      d.startSync();
      await d.settle();
    }
  }
  return checkOutcome(devices, await fullState(server, now), network.trace);
}

/** The server's state as a fresh device would see it: every page from the start, folded. */
export async function fullState(server: SimServer, nowMs: number): Promise<FieldState> {
  let state: FieldState = new Map();
  let since: string | undefined;
  for (;;) {
    const res = await server.handle({ kind: 'pull', since, limit: 1000 }, nowMs);
    if (res.status !== 200) throw new Error(`full pull answered ${res.status}`);
    const page = res.body as PullResponse;
    state = mergeChanges(state, page.changes);
    since = page.cursor;
    if (!page.hasMore) return state;
  }
}

/** The checks after a final sync: acknowledged writes kept (or beaten by a greater clock), devices equal to the server, refusals only for invalid changes. */
export function checkOutcome(devices: readonly SimDevice[], server: FieldState, trace: readonly TraceEntry[]): Outcome {
  const holds = (change: { collection: string; rowId: string; field: string; value: unknown; hlc: string }) => {
    const stored = server.get(`${change.collection}/${change.rowId}/${change.field}`);
    return stored !== undefined && (stored.hlc > change.hlc || (stored.hlc === change.hlc && isDeepStrictEqual(stored.value, change.value)));
  };
  const writes = devices.flatMap((d) => d.writes);
  const valid = writes.filter((w) => !w.invalid && !isSetWrite(w));
  const validSets = writes.filter((w) => !w.invalid && isSetWrite(w));
  const acknowledged = valid.filter((w) => devices.some((d) => d.acknowledged.has(w.change.id)));
  const setAside = new Set(devices.flatMap((d) => d.durable.setAside.map((s) => s.change.id)));
  const ackedSets = validSets.filter((w) => devices.some((d) => d.acknowledged.has(w.change.id)));
  const divergent = devices.filter((d) => !isDeepStrictEqual(deviceState(d), plain(server))).length;
  return {
    writes: writes.length,
    acknowledged: acknowledged.length + ackedSets.length,
    divergent,
    lostAcknowledged: acknowledged.filter((w) => !holds(w.change)).length,
    lostWrites: valid.filter((w) => !holds(w.change)).length,
    refusedValid: [...valid, ...validSets].filter((w) => setAside.has(w.change.id)).length,
    lostSetAdds: lostSetAdds(ackedSets, validSets, devices, server),
    setAsideClockAhead: devices.reduce((n, d) => n + d.durable.setAside.filter((s) => s.problem.code === 'clock_ahead').length, 0),
    acceptedInvalid: writes.filter((w) => w.invalid && !setAside.has(w.change.id)).length,
    outboxLeft: devices.reduce((n, d) => n + d.durable.outbox.length, 0),
    unexpected: devices.flatMap((d) => d.unexpected),
    finalState: server,
    trace,
  };
}

const isSetWrite = (w: WriteRecord) => fieldSpecOf(w.change.collection, w.change.field)?.kind === 'set';

/** The set-add invariant: each element an acknowledged write added (at its device's clock) is in every final set, unless a write that saw that add removed it. */
function lostSetAdds(acked: readonly WriteRecord[], all: readonly WriteRecord[], devices: readonly SimDevice[], server: FieldState): number {
  let lost = 0;
  for (const w of acked) {
    const { collection, rowId, field } = w.change;
    for (const [element, { a }] of Object.entries(w.change.value as OrSetState)) {
      for (const [node, added] of Object.entries(a)) {
        const removed = all.some(
          (other) =>
            other.change.collection === collection &&
            other.change.rowId === rowId &&
            other.change.field === field &&
            ((other.change.value as OrSetState)[element]?.r[node] ?? '') >= added,
        );
        if (removed) continue;
        const finals = [server.get(`${collection}/${rowId}/${field}`)?.value, ...devices.map((d) => d.durable.rows.get(`${collection}/${rowId}`)?.[field])];
        if (finals.some((elements) => !Array.isArray(elements) || !elements.includes(element))) lost++;
      }
    }
  }
  return lost;
}

/**
 * A device's rows as `collection/rowId/field → { value, hlc }` (a set field: its elements and
 * state; its clock is only the greatest seen, which a delta that adds nothing new leaves alone on
 * the server), sorted, like {@link plain}.
 */
function deviceState(device: SimDevice): Record<string, unknown> {
  const entries: [string, unknown][] = [];
  for (const [key, row] of device.durable.rows) {
    for (const [field, hlc] of Object.entries(row._hlc)) {
      const collection = key.split('/')[0]!;
      entries.push([
        `${key}/${field}`,
        fieldSpecOf(collection, field)?.kind === 'set' ? { value: row[field], state: row._sets?.[field] ?? {} } : { value: row[field], hlc },
      ]);
    }
  }
  return Object.fromEntries(entries.sort(([a], [b]) => (a < b ? -1 : 1)));
}

function plain(state: FieldState): Record<string, unknown> {
  return Object.fromEntries(
    [...state.entries()].sort(([a], [b]) => (a < b ? -1 : 1)).map(([key, { value, hlc, state: set }]) => [key, set ? { value, state: set } : { value, hlc }]),
  );
}

/** Whether an outcome passes every check. */
export const isClean = (o: Outcome) =>
  o.divergent === 0 &&
  o.lostAcknowledged === 0 &&
  o.lostWrites === 0 &&
  o.refusedValid === 0 &&
  o.lostSetAdds === 0 &&
  o.setAsideClockAhead === 0 &&
  o.acceptedInvalid === 0 &&
  o.outboxLeft === 0 &&
  o.unexpected.length === 0;

/** The counts of an outcome, for messages. */
export const summary = ({ finalState: _s, trace: _t, ...counts }: Outcome) => counts;
