/**
 * Throws a RangeError unless `timeZone` is an IANA zone name the runtime knows. TZDate turns an
 * unknown zone into NaN dates silently; failing loudly here keeps a typo from becoming an empty
 * log.
 *
 * @example
 * assertTimeZone('America/Los_Angeles') // returns
 * assertTimeZone('Mars/Olympus_Mons')   // throws RangeError
 */
export function assertTimeZone(timeZone: string): void {
  // Intl.DateTimeFormat throws RangeError for an unknown zone (ECMA-402).
  new Intl.DateTimeFormat('en-US', { timeZone });
}
