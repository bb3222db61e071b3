import bcrypt from 'bcryptjs';

/** A job for the password threads: hash a pre-digested password, or compare one with a hash. */
export type PasswordJob =
  { readonly op: 'hash'; readonly digest: string; readonly cost: number } | { readonly op: 'compare'; readonly digest: string; readonly hash: string };

/**
 * Runs in a worker thread (piscina), so bcrypt's deliberate slowness never blocks the thread
 * that answers other readers. The synchronous calls are right here: this thread does nothing else.
 */
export default function passwordWorker(job: PasswordJob): string | boolean {
  return job.op === 'hash' ? bcrypt.hashSync(job.digest, job.cost) : bcrypt.compareSync(job.digest, job.hash);
}
