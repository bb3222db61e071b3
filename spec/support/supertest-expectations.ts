import { Test } from 'supertest';

/**
 * Loaded as a Jasmine helper: each supertest `.expect(…)` chain is also reported to Jasmine as an
 * expectation (passing or failing with supertest's own message), so specs written only with
 * supertest's assertions count as asserting something under `failSpecWithNoExpectations`.
 */
type Assert = (resError: Error | null, res: unknown, fn: (err: Error | null, res: unknown) => void) => void;
const prototype = Test.prototype as unknown as { assert: Assert; _asserts: unknown[]; method: string; url: string };
const supertestAssert = prototype.assert;

prototype.assert = function (this: typeof prototype, resError, res, fn) {
  supertestAssert.call(this, resError, res, (err, response) => {
    if (this._asserts.length > 0)
      expect(err?.message ?? null)
        .withContext(`supertest: ${this.method} ${this.url}`)
        .toBeNull();
    fn(err, response);
  });
};
