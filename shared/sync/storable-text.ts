/** A lone (unpaired) UTF-16 surrogate: not a character, so not encodable as UTF-8. */
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/**
 * Why a value cannot be stored as PostgreSQL text or jsonb, or `null`. PostgreSQL refuses NUL
 * (U+0000) in text and `\u0000` in jsonb, and UTF-8 (RFC 3629 §3) has no encoding for surrogate
 * code points; both would fail the whole batch on the server. Looks into lists and objects,
 * keys included.
 */
export function unstorableText(value: unknown, depth = 0): string | null {
  if (typeof value === 'string') {
    if (value.includes('\u0000')) return 'must not contain the NUL character';
    if (LONE_SURROGATE.test(value)) return 'must not contain a broken character (an unpaired surrogate)';
    return null;
  }
  if (typeof value !== 'object' || value === null || depth > 8) return null;
  for (const [key, item] of Array.isArray(value) ? value.map((v, i) => [String(i), v] as const) : Object.entries(value)) {
    const problem = unstorableText(key, depth + 1) ?? unstorableText(item, depth + 1);
    if (problem) return problem;
  }
  return null;
}
