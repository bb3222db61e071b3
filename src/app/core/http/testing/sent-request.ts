import type { HttpTestingController, TestRequest } from '@angular/common/http/testing';

const turn = () => new Promise((resolve) => setTimeout(resolve, 5));

/**
 * The request to `url` once the code under test has sent it (token lookups, Web Locks and
 * IndexedDB take a few turns of the event loop first). Fails after `turns` turns.
 */
export async function sentRequest(backend: HttpTestingController, url: string, turns = 100): Promise<TestRequest> {
  for (let i = 0; i < turns; i++) {
    const [found] = backend.match(url);
    if (found) return found;
    await turn();
  }
  throw new Error(`no request to ${url} was sent`);
}
