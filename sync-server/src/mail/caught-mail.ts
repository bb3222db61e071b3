import { mkdir, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';

import type { CaughtMail } from '../../../shared/api/admin';

/** How many caught messages the admin page shows, newest first. */
const SHOWN = 50;

/** One JSON file per message; the name sorts by arrival. */
export async function writeCaughtMail(dir: string, mail: CaughtMail): Promise<void> {
  await mkdir(dir, { recursive: true });
  const name = `${mail.receivedAt.replace(/[:.]/g, '-')}-${mail.id}.json`;
  await writeFile(path.join(dir, name), JSON.stringify(mail, null, 2));
}

export async function readCaughtMail(dir: string): Promise<CaughtMail[]> {
  let names: string[];
  try {
    names = (await readdir(dir)).filter((name) => name.endsWith('.json'));
  } catch {
    return []; // nothing caught yet
  }
  const newest = names.sort().reverse().slice(0, SHOWN);
  return Promise.all(newest.map(async (name) => JSON.parse(await readFile(path.join(dir, name), 'utf8')) as CaughtMail));
}

/** Empties the development inbox; answers how many messages went. */
export async function emptyCaughtMail(dir: string): Promise<number> {
  let names: string[];
  try {
    names = (await readdir(dir)).filter((name) => name.endsWith('.json'));
  } catch {
    return 0;
  }
  await Promise.all(names.map((name) => rm(path.join(dir, name), { force: true })));
  return names.length;
}
