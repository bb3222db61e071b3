/** A screen wake lock for specs: hands out sentinels and keeps them, so specs can see what is held. */
export class FakeWakeLock {
  readonly sentinels: FakeSentinel[] = [];

  async request(_type?: 'screen'): Promise<WakeLockSentinel> {
    const sentinel = new FakeSentinel();
    this.sentinels.push(sentinel);
    return sentinel as unknown as WakeLockSentinel;
  }

  /** Locks taken and not let go. */
  get held(): number {
    return this.sentinels.filter((s) => !s.released).length;
  }
}

/** A lock; `release()` is also what the browser does when the page is hidden. */
export class FakeSentinel extends EventTarget {
  released = false;
  readonly type = 'screen';
  onrelease: ((this: WakeLockSentinel, ev: Event) => unknown) | null = null;

  async release(): Promise<void> {
    if (this.released) return;
    this.released = true;
    this.dispatchEvent(new Event('release'));
  }
}
