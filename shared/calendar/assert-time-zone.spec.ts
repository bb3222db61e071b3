import { assertTimeZone } from './assert-time-zone';

describe('assertTimeZone', () => {
  it('accepts IANA zone names', () => {
    // IANA Time Zone Database names.
    expect(() => assertTimeZone('UTC')).not.toThrow();
    expect(() => assertTimeZone('America/Los_Angeles')).not.toThrow();
    expect(() => assertTimeZone('Asia/Tokyo')).not.toThrow();
  });

  it('throws RangeError for a name that is not a zone (ECMA-402 IsValidTimeZoneName)', () => {
    expect(() => assertTimeZone('Mars/Olympus_Mons')).toThrowError(RangeError);
    expect(() => assertTimeZone('')).toThrowError(RangeError);
  });
});
