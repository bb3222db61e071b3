/**
 * Covers in an export. A book's `coverId` names an uploaded picture by the hex SHA-256 of its
 * bytes (FIPS 180-4); the file carries each picture the reader's books show as a data URL
 * (RFC 2397, base64) beside that id, so the file alone restores them, and an import checks
 * the bytes against the id before keeping them.
 */
export interface ExportCover {
  /** The hex SHA-256 of the picture's bytes: the `coverId` books name. */
  readonly id: string;
  /** `data:image/…;base64,…` (RFC 2397). */
  readonly dataUrl: string;
}

/** The picture types covers are stored as (what `core/covers/prepare-cover.ts` and uploads accept). */
export const COVER_MEDIA_TYPES = ['image/webp', 'image/jpeg', 'image/png'] as const;

const DATA_URL = /^data:(image\/(?:webp|jpeg|png));base64,([A-Za-z0-9+/]*={0,2})$/;

/** The JSON Schema (draft 2020-12) of the file's `covers` list. */
export function coversSchema(): Record<string, unknown> {
  return {
    type: 'array',
    description: 'Pictures the books show (coverId), each as a base64 data URL with the hex SHA-256 of its bytes.',
    items: {
      type: 'object',
      required: ['id', 'dataUrl'],
      additionalProperties: false,
      properties: {
        id: { type: 'string', pattern: '^[0-9a-f]{64}$' },
        dataUrl: { type: 'string', pattern: DATA_URL.source },
      },
    },
  };
}

/** A cover's media type and base64 bytes, or `null` when it is no picture data URL we keep. */
export function readCoverDataUrl(dataUrl: unknown): { readonly mediaType: string; readonly base64: string } | null {
  const match = typeof dataUrl === 'string' ? DATA_URL.exec(dataUrl) : null;
  return match ? { mediaType: match[1]!, base64: match[2]! } : null;
}

/** The ids of the covers a file should carry: those current books name, once each. */
export function coverIdsOf(books: readonly Readonly<Record<string, unknown>>[]): string[] {
  return [...new Set(books.flatMap((book) => (book['deleted'] !== true && typeof book['coverId'] === 'string' ? [book['coverId']] : [])))].sort();
}
