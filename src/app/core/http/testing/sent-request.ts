import type { HttpTestingController, TestRequest } from '@angular/common/http/testing';

import { patienceDeadline, stillPatient } from '../../testing/patience';

const turn = () => new Promise((resolve) => setTimeout(resolve, 5));

/**
 * The request to `url` once the code under test has sent it (token lookups, Web Locks and
 * IndexedDB take a few turns of the event loop first).
 */
export async function sentRequest(backend: HttpTestingController, url: string): Promise<TestRequest> {
  for (const deadline = patienceDeadline(); stillPatient(deadline);) {
    const [found] = backend.match(url);
    if (found) return found;
    await turn();
  }
  throw new Error(`no request to ${url} was sent`);
}
