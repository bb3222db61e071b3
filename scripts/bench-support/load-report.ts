/** What `npm run bench:load` measures and prints: per-kind rates and latencies, server CPU, RSS. */
import { readdirSync, readFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';

import { quantile } from 'simple-statistics';

export type Kind = 'empty pull' | 'small push' | 'big pull';
export const KINDS: readonly Kind[] = ['empty pull', 'small push', 'big pull'];

export interface Tally {
  latencies: Record<Kind, number[]>;
  errors: Record<Kind, number>;
  statuses: Map<number | string, number>;
  seconds: number;
  /** CPU seconds the server processes spent during the run (user + system). */
  serverCpuSeconds: number;
  /** CPU seconds per part of the set-up (servers, PostgreSQL, nginx, this client) during the run. */
  cpuByPart: Record<string, number>;
}

export interface Row {
  readonly count: number;
  readonly rps: number;
  readonly p50: number;
  readonly p99: number;
  readonly errors: number;
}

export interface Summary {
  readonly label: string;
  readonly rps: number;
  readonly errors: number;
  /** Server CPU per request: the figure least moved by other work on a shared machine. */
  readonly cpuMsPerRequest: number;
  /** CPU per request of every part together (servers, PostgreSQL, nginx, this client). */
  readonly allCpuMsPerRequest: number;
  readonly rows: Record<Kind, Row>;
}

export function newTally(seconds: number): Tally {
  return {
    latencies: { 'empty pull': [], 'small push': [], 'big pull': [] },
    errors: { 'empty pull': 0, 'small push': 0, 'big pull': 0 },
    statuses: new Map(),
    seconds,
    serverCpuSeconds: 0,
    cpuByPart: {},
  };
}

/** Resident memory of a process, MB (Linux /proc). */
export function rssMb(pid: number | undefined): number {
  const match = /VmRSS:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
  return Math.round(Number(match?.[1]) / 1024);
}

/** CPU seconds (user + system) a process has used so far (Linux /proc, fields 14 and 15 of stat). */
export function cpuSeconds(pid: number | undefined): number {
  const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
  const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
  return (Number(fields[11]) + Number(fields[12])) / 100; // clock ticks; USER_HZ is 100 on Linux
}

/** Parent pid of a process (Linux /proc, field 4 of stat). */
export function parentPid(pid: number): number {
  const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
  return Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]);
}

/**
 * CPU seconds of a process and all its descendants, live or finished (a finished child's time is
 * in its parent's cutime/cstime once reaped): PostgreSQL's backends, nginx's worker. 0 when gone.
 */
export function treeCpuSeconds(root: number | undefined): number {
  if (!root) return 0;
  const children = new Map<number, number[]>();
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const parent = parentPid(Number(entry));
      children.set(parent, [...(children.get(parent) ?? []), Number(entry)]);
    } catch {
      // exited while listing
    }
  }
  let total = 0;
  const visit = (pid: number, withReaped: boolean) => {
    try {
      const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
      const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
      total += (Number(fields[11]) + Number(fields[12]) + (withReaped ? Number(fields[13]) + Number(fields[14]) : 0)) / 100;
    } catch {
      return;
    }
    for (const child of children.get(pid) ?? []) visit(child, withReaped);
  };
  visit(root, true);
  return total;
}

export function summarise(label: string, tally: Tally): Summary {
  const rows = {} as Record<Kind, Row>;
  for (const kind of KINDS) {
    const list = tally.latencies[kind];
    rows[kind] = {
      count: list.length,
      rps: list.length / tally.seconds,
      p50: list.length ? quantile(list, 0.5) : NaN,
      p99: list.length ? quantile(list, 0.99) : NaN,
      errors: tally.errors[kind],
    };
  }
  const total = KINDS.reduce((sum, kind) => sum + rows[kind].count, 0);
  const errors = KINDS.reduce((sum, kind) => sum + rows[kind].errors, 0);
  const allCpuSeconds = Object.values(tally.cpuByPart).reduce((sum, seconds) => sum + seconds, 0);
  return {
    label,
    rps: total / tally.seconds,
    errors,
    cpuMsPerRequest: total ? (tally.serverCpuSeconds * 1000) / total : NaN,
    allCpuMsPerRequest: total && allCpuSeconds ? (allCpuSeconds * 1000) / total : NaN,
    rows,
  };
}

export function printSummary(summary: Summary, tally: Tally, connections: number): void {
  const statuses = [...tally.statuses].map(([status, n]) => `${status}×${n}`).join(', ');
  console.log(
    `\n${summary.label}: ${summary.rps.toFixed(0)} requests/s, ${summary.errors} errors, server CPU ${summary.cpuMsPerRequest.toFixed(2)} ms/request (statuses: ${statuses})`,
  );
  printCpuBudget(summary, tally, connections);
  for (const kind of KINDS) {
    const row = summary.rows[kind];
    console.log(
      `  ${kind.padEnd(11)} ${row.rps.toFixed(0).padStart(6)}/s  p50 ${row.p50.toFixed(1).padStart(7)} ms  p99 ${row.p99.toFixed(1).padStart(7)} ms  errors ${row.errors}`,
    );
  }
}

/**
 * Where the machine's CPU goes per request, by part, and what that allows: the whole set-up
 * shares this machine's cores, so it serves at most cores ÷ (CPU per request) requests a second,
 * and with a fixed number of connections each waiting for its answer (a closed loop), the mean
 * latency is at least connections ÷ that rate (Little's law), whatever the server does.
 */
function printCpuBudget(summary: Summary, tally: Tally, connections: number): void {
  const total = KINDS.reduce((sum, kind) => sum + summary.rows[kind].count, 0);
  const parts = Object.entries(tally.cpuByPart);
  if (parts.length === 0 || total === 0) return;
  const perRequest = parts.map(([name, seconds]) => [name, (seconds * 1000) / total] as const);
  const sum = perRequest.reduce((acc, [, ms]) => acc + ms, 0);
  const ceiling = (availableParallelism() * 1000) / sum;
  console.log(
    `  CPU per request: ${perRequest.map(([name, ms]) => `${name} ${ms.toFixed(2)}`).join(' + ')} = ${sum.toFixed(2)} ms → at most ${ceiling.toFixed(0)} requests/s on ${availableParallelism()} cores, so ${connections} connections wait at least ${((connections / ceiling) * 1000).toFixed(0)} ms per request on average (Little's law)`,
  );
}

/** The closing table: each run side by side, the cluster's ratios to the single instance, the goals. */
export function printClosing(cluster: Summary, single: Summary, soak: readonly string[], connections: number): void {
  console.log('\n== Summary ==');
  console.log(`${''.padEnd(22)}${'cluster'.padStart(24)}${'single instance'.padStart(26)}${'ratio'.padStart(16)}`);
  const line = (name: string, c: string, s: string, ratio: string) => console.log(`${name.padEnd(22)}${c.padStart(24)}${s.padStart(26)}${ratio.padStart(16)}`);
  line('requests/s', cluster.rps.toFixed(0), single.rps.toFixed(0), `×${(cluster.rps / single.rps).toFixed(2)}`);
  line('errors', String(cluster.errors), String(single.errors), '');
  line(
    'server CPU ms/request',
    cluster.cpuMsPerRequest.toFixed(2),
    single.cpuMsPerRequest.toFixed(2),
    `×${(cluster.cpuMsPerRequest / single.cpuMsPerRequest).toFixed(2)}`,
  );
  line(
    'all CPU ms/request',
    cluster.allCpuMsPerRequest.toFixed(2),
    single.allCpuMsPerRequest.toFixed(2),
    `×${(cluster.allCpuMsPerRequest / single.allCpuMsPerRequest).toFixed(2)}`,
  );
  // What the machine allows: cores ÷ CPU per request, and Little's law for the connections.
  const ceiling = (summary: Summary) => (availableParallelism() * 1000) / summary.allCpuMsPerRequest;
  line('ceiling requests/s', ceiling(cluster).toFixed(0), ceiling(single).toFixed(0), '');
  line(`mean wait floor ms`, ((connections / ceiling(cluster)) * 1000).toFixed(0), ((connections / ceiling(single)) * 1000).toFixed(0), '');
  for (const kind of KINDS) {
    const c = cluster.rows[kind];
    const s = single.rows[kind];
    line(`${kind} p50/p99 ms`, `${c.p50.toFixed(1)} / ${c.p99.toFixed(1)}`, `${s.p50.toFixed(1)} / ${s.p99.toFixed(1)}`, `p99 ×${(c.p99 / s.p99).toFixed(2)}`);
  }
  for (const entry of soak) console.log(`soak ${entry}`);
  const within = (['empty pull', 'small push'] as Kind[]).every((kind) => cluster.rows[kind].p99 < 100);
  console.log(`Goal p99 < 100 ms for empty pulls and small pushes through the cluster: ${within ? 'met' : 'NOT met'}; errors: ${cluster.errors + single.errors}`);
  const floor = (connections / ceiling(cluster)) * 1000;
  if (!within && floor >= 50) {
    console.log(
      `  With ${connections} connections and no pause between requests, this machine's cores allow a mean wait of no less than ${floor.toFixed(0)} ms through the cluster: p99 < 100 ms needs less CPU per request, more cores or fewer connections.`,
    );
  }
}
