import * as Y from 'yjs';

const UNSTORABLE = /\u0000|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;

/**
 * What is wrong with a Yjs update for the text named `name`, judged from the update alone, or
 * null. It must decode, and everything it inserts must be plain characters (no embeds, nested
 * types or formatting) placed directly in this text's root type or after characters of it.
 * Whether it fits the stored state is {@link mergeTextUpdate}'s part.
 */
export function textUpdateProblem(name: string, update: Uint8Array): string | null {
  let decoded: ReturnType<typeof Y.decodeUpdate>;
  try {
    decoded = Y.decodeUpdate(update);
  } catch {
    return 'is not a Yjs update (it does not decode)';
  }
  for (const struct of decoded.structs) {
    if (!(struct instanceof Y.Item)) continue;
    if (!(struct.content instanceof Y.ContentString) && !(struct.content instanceof Y.ContentDeleted)) {
      return 'may only insert plain text';
    }
    if (struct.parentSub !== null) return 'may only insert plain text';
    // PostgreSQL text refuses NUL, and a lone surrogate is no character (Unicode §3.9, D91).
    if (struct.content instanceof Y.ContentString && UNSTORABLE.test(struct.content.str)) {
      return 'contains a NUL or a lone surrogate, which is not text';
    }
    // A parent is named only when the item has no neighbours to place it; it must be this text.
    // Decoded (not integrated) items hold their parent's name, or an ID for a nested type.
    const parent = struct.parent as unknown;
    if (parent !== null && parent !== name) return 'belongs to another text';
  }
  return null;
}
