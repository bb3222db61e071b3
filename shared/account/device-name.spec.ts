import { deviceNameFromUserAgent } from './device-name';

describe('deviceNameFromUserAgent', () => {
  it('names a device by browser and system (user agents as the browsers send them)', () => {
    expect(deviceNameFromUserAgent('Mozilla/5.0 (Android 14; Mobile; rv:128.0) Gecko/128.0 Firefox/128.0')).toBe('Firefox on Android');
    expect(deviceNameFromUserAgent('Mozilla/5.0 (X11; Linux x86_64) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/125.0 Safari/537.36')).toBe('Chrome on Linux');
    expect(deviceNameFromUserAgent(undefined)).toBe('Unknown device');
  });
});
