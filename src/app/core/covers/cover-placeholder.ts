/**
 * The stand-in for a book without a cover: its initials on a colour picked from its title, the
 * same on every device. Dark, muted colours, so the light initials read well on any of them.
 */
export const PLACEHOLDER_COLOURS = ['#6b3e26', '#2f5d50', '#3b4a6b', '#6a3d5a', '#4d5b2a', '#7a3b2e', '#2e5266', '#5a4a3a'] as const;
/** The initials' colour, a warm paper white. */
export const PLACEHOLDER_INK = '#fdf6ec';

/** Up to two initials: the first letters of the title's first two words, in capitals. */
export function titleInitials(title: string | null | undefined): string {
  const words = (title ?? '').split(/\s+/).filter((word) => /[\p{L}\p{N}]/u.test(word));
  return words
    .slice(0, 2)
    .map((word) => (word.match(/[\p{L}\p{N}]/u)?.[0] ?? '').toLocaleUpperCase())
    .join('');
}

/** The placeholder colour of a title: one of {@link PLACEHOLDER_COLOURS}, by a hash of its text. */
export function placeholderColour(title: string | null | undefined): string {
  const key = (title ?? '').trim().toLocaleLowerCase();
  return PLACEHOLDER_COLOURS[fnv1a32(key) % PLACEHOLDER_COLOURS.length]!;
}

/** 32-bit FNV-1a over the UTF-8 bytes of `text`: small, fast and well spread for short keys. */
export function fnv1a32(text: string): number {
  let hash = 0x811c9dc5;
  for (const byte of new TextEncoder().encode(text)) {
    hash ^= byte;
    hash = Math.imul(hash, 0x01000193) >>> 0;
  }
  return hash >>> 0;
}
