import Bowser from 'bowser';

/**
 * A readable default name for a device session, from its user agent ("Firefox on Android").
 * Readers can rename it; it only helps them recognise a lost tablet in their list.
 */
export function deviceNameFromUserAgent(userAgent: string | undefined): string {
  if (!userAgent) return 'Unknown device';
  const parser = Bowser.getParser(userAgent);
  const browser = parser.getBrowserName() || 'Browser';
  const os = parser.getOSName();
  return os ? `${browser} on ${os}` : browser;
}
