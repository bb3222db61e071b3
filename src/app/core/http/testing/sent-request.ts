import type { HttpTestingController, TestRequest } from '@angular/common/http/testing';

import { patiently } from '../../testing/patience';

/**
 * The request to `url` once the code under test has sent it (token lookups, Web Locks and
 * IndexedDB take a few turns of the event loop first).
 */
export function sentRequest(backend: HttpTestingController, url: string): Promise<TestRequest> {
  return patiently(`a request to ${url}`, () => backend.match(url)[0]);
}
