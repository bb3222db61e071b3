import { SerialJob, withTabLock } from './serial-job';

describe('SerialJob', () => {
  it('runs one round at a time, and one more round for triggers that came mid-round', async () => {
    let rounds = 0;
    let release!: () => void;
    const job = new SerialJob(async () => {
      rounds++;
      if (rounds === 1) await new Promise<void>((resolve) => (release = resolve));
    });
    const first = job.run();
    const second = job.run();
    const third = job.run();
    expect(second).toBe(first);
    expect(third).toBe(first);
    expect(rounds).toBe(1);
    release();
    await first;
    await new Promise((resolve) => setTimeout(resolve, 10)); // the extra round is scheduled at 0 ms
    expect(rounds).toBe(2);
    job.stop();
  });

  it('replaces a waiting round when scheduled again, and runs none after stop', () => {
    jasmine.clock().install();
    try {
      let rounds = 0;
      const job = new SerialJob(async () => void rounds++);
      job.schedule(1000);
      job.schedule(5000);
      jasmine.clock().tick(1000);
      expect(rounds).toBe(0);
      jasmine.clock().tick(4000);
      expect(rounds).toBe(1);
      job.schedule(10);
      job.stop();
      job.schedule(10);
      jasmine.clock().tick(100);
      expect(rounds).toBe(1);
    } finally {
      jasmine.clock().uninstall();
    }
  });

  it('waits longer after each failure and starts over after a success', async () => {
    jasmine.clock().install();
    try {
      let rounds = 0;
      const job = new SerialJob(async () => void rounds++);
      // retryDelayMs: 1 s doubling per attempt with equal jitter, so attempt 3 waits 4 to 8 s.
      for (let i = 0; i < 4; i++) job.retryLater();
      jasmine.clock().tick(3999);
      expect(rounds).toBe(0);
      jasmine.clock().tick(4001);
      expect(rounds).toBe(1);
      for (let i = 0; i < 5; i++) await Promise.resolve(); // the round settles (microtasks, not the mock clock)
      job.succeeded();
      job.retryLater(); // attempt 0 again: 0.5 to 1 s
      jasmine.clock().tick(1000);
      expect(rounds).toBe(2);
      job.stop();
    } finally {
      jasmine.clock().uninstall();
    }
  });
});

describe('withTabLock', () => {
  it('runs the work when the lock is free and skips it while another holder has it', async () => {
    const name = `serial-job-spec-${Math.random()}`;
    let ran = 0;
    let release!: () => void;
    const holder = navigator.locks.request(name, () => new Promise<void>((resolve) => (release = resolve)));
    await new Promise((resolve) => setTimeout(resolve, 0));
    expect(await withTabLock(name, async () => void ran++)).toBeFalse();
    release();
    await holder;
    expect(await withTabLock(name, async () => void ran++)).toBeTrue();
    expect(ran).toBe(1);
  });
});
