import fc from 'fast-check';

/**
 * Checks a fast-check property as a Jasmine expectation (the counterexample in the message), so
 * a spec made only of properties still counts as asserting something under
 * `failSpecWithNoExpectations`.
 */
export function expectProperty<Ts>(property: fc.IProperty<Ts>, params?: fc.Parameters<Ts>): void {
  const details = fc.check(property, params);
  expect(details.failed)
    .withContext(fc.defaultReportMessage(details) ?? '')
    .toBeFalse();
}
