import { secondsUntilExpiry, tokenReceived } from './stored-session';

/** An unsigned JWT (RFC 7519 §3: header.payload.signature, base64url) with these claims. */
const token = (claims: Record<string, number>) => `e30.${btoa(JSON.stringify(claims)).replace(/\+/g, '-').replace(/\//g, '_').replace(/=+$/, '')}.sig`;

describe('secondsUntilExpiry', () => {
  const serverNow = Date.UTC(2026, 11, 4, 12, 0, 0) / 1000;
  const fifteenMinutes = token({ iat: serverNow, exp: serverNow + 900 });

  it("reads the expiry against this device's clock for a token it did not see arrive", () => {
    expect(secondsUntilExpiry(fifteenMinutes, (serverNow + 60) * 1000)).toBe(840);
  });

  it("measures a token's age from its arrival, so a device 3 days ahead does not find it expired", () => {
    const threeDaysAhead = (serverNow + 3 * 86_400) * 1000;
    const fresh = token({ iat: serverNow, exp: serverNow + 900, n: 1 });
    tokenReceived(fresh, threeDaysAhead);

    expect(secondsUntilExpiry(fresh, threeDaysAhead + 60_000)).toBe(840);
    expect(secondsUntilExpiry(fresh, threeDaysAhead + 1_000_000)).toBeLessThan(0);
  });
});
