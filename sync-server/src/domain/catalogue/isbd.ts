/**
 * Drops the ISBD punctuation that catalogues write at the end of a subfield to introduce the
 * next one (" /" before a statement of responsibility, " :" before a subtitle, " ;" before a
 * series number, " =" before a parallel title, "," and a closing ".").
 *
 * `keepPeriod` keeps a closing period (an edition's "2nd ed."). A closing period also stays after an initial ("Ashby, N. K.") and after an ellipsis.
 *
 * @example
 * withoutIsbdEnding('Moths of the lower fen :') // 'Moths of the lower fen'
 * withoutIsbdEnding('a year on the quay /')    // 'a year on the quay'
 * withoutIsbdEnding('Ashby, N. K.')            // 'Ashby, N. K.'
 */
export function withoutIsbdEnding(value: string, keepPeriod = false): string {
  let text = value.trim();
  for (;;) {
    const next = text.replace(/\s*[/:;=,]$/, '').trimEnd();
    if (next === text) break;
    text = next;
  }
  if (!keepPeriod && text.endsWith('.') && !text.endsWith('..') && !/(^|[\s.])\p{Lu}\.$/u.test(text)) text = text.slice(0, -1).trimEnd();
  return text;
}

/** "[Lanternfield Press]" → "Lanternfield Press": brackets mark words a cataloguer supplied. */
export function withoutBrackets(value: string): string {
  const match = /^\[(.*)\]$/.exec(value.trim());
  return match ? match[1]!.trim() : value.trim();
}
