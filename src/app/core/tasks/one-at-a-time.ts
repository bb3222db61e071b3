/**
 * Runs tasks one after another. List fields (other goals, prompts) are written whole, so two
 * quick edits that each read the list before the other wrote it would undo one another; run
 * through here, and reading the row afresh inside the task, each edit sees the one before.
 */
export class OneAtATime {
  private last: Promise<unknown> = Promise.resolve();

  /** Starts `task` once every task given before it has settled. */
  run<T>(task: () => Promise<T>): Promise<T> {
    const next = this.last.then(task, task);
    this.last = next.catch(() => undefined);
    return next;
  }
}
