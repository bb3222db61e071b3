/** What `npm run bench:load` measures and prints: per-kind rates and latencies, server CPU, RSS. */
import { readFileSync } from 'node:fs';

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
  readonly rows: Record<Kind, Row>;
}

export function newTally(seconds: number): Tally {
  return {
    latencies: { 'empty pull': [], 'small push': [], 'big pull': [] },
    errors: { 'empty pull': 0, 'small push': 0, 'big pull': 0 },
    statuses: new Map(),
    seconds,
    serverCpuSeconds: 0,
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
  return { label, rps: total / tally.seconds, errors, cpuMsPerRequest: total ? (tally.serverCpuSeconds * 1000) / total : NaN, rows };
}

export function printSummary(summary: Summary, tally: Tally): void {
  const statuses = [...tally.statuses].map(([status, n]) => `${status}×${n}`).join(', ');
  console.log(
    `\n${summary.label}: ${summary.rps.toFixed(0)} requests/s, ${summary.errors} errors, server CPU ${summary.cpuMsPerRequest.toFixed(2)} ms/request (statuses: ${statuses})`,
  );
  for (const kind of KINDS) {
    const row = summary.rows[kind];
    console.log(
      `  ${kind.padEnd(11)} ${row.rps.toFixed(0).padStart(6)}/s  p50 ${row.p50.toFixed(1).padStart(7)} ms  p99 ${row.p99.toFixed(1).padStart(7)} ms  errors ${row.errors}`,
    );
  }
}

/** The closing table: each run side by side, the cluster's ratios to the single instance, the goals. */
export function printClosing(cluster: Summary, single: Summary, soak: readonly string[]): void {
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
  for (const kind of KINDS) {
    const c = cluster.rows[kind];
    const s = single.rows[kind];
    line(`${kind} p50/p99 ms`, `${c.p50.toFixed(1)} / ${c.p99.toFixed(1)}`, `${s.p50.toFixed(1)} / ${s.p99.toFixed(1)}`, `p99 ×${(c.p99 / s.p99).toFixed(2)}`);
  }
  for (const entry of soak) console.log(`soak ${entry}`);
  const within = (['empty pull', 'small push'] as Kind[]).every((kind) => cluster.rows[kind].p99 < 100);
  console.log(`Goal p99 < 100 ms for empty pulls and small pushes through the cluster: ${within ? 'met' : 'NOT met'}; errors: ${cluster.errors + single.errors}`);
}
