/**
 * A record of the local catalogue in the shape `marcjs` uses, so specs can hand the same fields
 * to that reference library: a control field is `[tag, value]`, a data field is
 * `[tag, ind1 + ind2, code, value, code, value, …]`.
 */
export type MarcField = readonly string[];

export interface LocalRecord {
  readonly leader: string;
  readonly fields: readonly MarcField[];
}

const ENTITIES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };
/** Text as XML character data or an attribute value. */
export const escapeXml = (text: string) => text.replace(/[&<>"']/g, (c) => ENTITIES[c]!);

/** One record as MARCXML (the Library of Congress MARC 21 XML schema, "slim"). */
export function toMarcXml(record: LocalRecord, namespace = true): string {
  const lines = [`<record${namespace ? ' xmlns="http://www.loc.gov/MARC21/slim"' : ''}>`, `<leader>${escapeXml(record.leader)}</leader>`];
  for (const [tag, ...rest] of record.fields) {
    if (rest.length === 1) {
      lines.push(`<controlfield tag="${tag}">${escapeXml(rest[0]!)}</controlfield>`);
      continue;
    }
    const indicators = rest[0]!;
    lines.push(`<datafield tag="${tag}" ind1="${indicators[0] ?? ' '}" ind2="${indicators[1] ?? ' '}">`);
    for (let i = 1; i < rest.length; i += 2) lines.push(`<subfield code="${rest[i]}">${escapeXml(rest[i + 1]!)}</subfield>`);
    lines.push('</datafield>');
  }
  lines.push('</record>');
  return lines.join('\n');
}

/** A 40-character 008 for books (MARC 21 Bibliographic, "008 – Books"). */
export function field008(year: number, language: string, formOfItem = ' '): string {
  const entered = '250101';
  // 00-05 entered, 06 type of date, 07-10 date 1, 11-14 date 2, 15-17 place, 23 form of item, 35-37 language.
  return `${entered}s${year}    xx ${' '.repeat(5)}${formOfItem}${' '.repeat(11)}${language} d`;
}

/** A leader: record length and base address are left as zeros (MARCXML does not need them). */
export function leader(typeOfRecord: 'a' | 'i'): string {
  return `00000n${typeOfRecord}m a2200000 i 4500`;
}
