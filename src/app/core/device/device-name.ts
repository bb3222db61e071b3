/**
 * A readable name for this browser ("Chrome on Linux"), shown on other devices while this one
 * runs the reading timer. The same shape as the server's default device-session name; a plain
 * look at the user agent is enough for that, so no parser is loaded into the app.
 */
export function deviceNameFrom(userAgent: string): string {
  const browser = /Edg\//.test(userAgent)
    ? 'Edge'
    : /OPR\//.test(userAgent)
      ? 'Opera'
      : /Firefox\//.test(userAgent)
        ? 'Firefox'
        : /Chrom(e|ium)\//.test(userAgent)
          ? 'Chrome'
          : /Safari\//.test(userAgent)
            ? 'Safari'
            : 'Browser';
  const os = /Android/.test(userAgent)
    ? 'Android'
    : /iPhone|iPad|iPod/.test(userAgent)
      ? 'iOS'
      : /CrOS/.test(userAgent)
        ? 'Chrome OS'
        : /Mac OS X/.test(userAgent)
          ? 'macOS'
          : /Windows/.test(userAgent)
            ? 'Windows'
            : /Linux/.test(userAgent)
              ? 'Linux'
              : '';
  return os ? `${browser} on ${os}` : browser;
}

/** This browser's name, from its user agent. */
export function thisDeviceName(): string {
  return deviceNameFrom(globalThis.navigator?.userAgent ?? '');
}
