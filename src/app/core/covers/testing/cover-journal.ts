import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';

import { sent } from '../../sync/testing/sync-backend';
import { openTestJournal, type TestJournal } from '../../testing/test-journal';

/** What a cover spec works with: a fresh journal, already open, and a fake HTTP backend. */
export interface CoverJournal {
  readonly journal: TestJournal;
  readonly backend: HttpTestingController;
  /** The request to `url` once it has been sent. */
  sent(url: string): ReturnType<typeof sent>;
}

/**
 * Registers the setup the cover specs share: before each spec a journal opened at once (so
 * teardown never closes it mid-open); after it, no request left unanswered, then the journal
 * closed. Read the returned function inside specs.
 */
export function useCoverJournal(): () => CoverJournal {
  let current: CoverJournal;
  beforeEach(async () => {
    const journal = openTestJournal([provideHttpClientTesting()]);
    const backend = TestBed.inject(HttpTestingController);
    current = { journal, backend, sent: (url) => sent(backend, url) };
    await journal.db.open();
  });
  afterEach(async () => {
    current.backend.verify();
    await current.journal.close();
  });
  return () => current;
}
