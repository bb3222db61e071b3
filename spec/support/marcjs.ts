/**
 * `marcjs` (npm, a MARC library in JavaScript) as the specs' reference reader and writer of
 * MARCXML. It ships no types; these are the parts the specs use.
 */
export interface MarcjsRecord {
  leader: string;
  fields: string[][];
  get(match: string): { tag: string; ind1?: string; ind2?: string; value?: string; subf?: [string, string][] }[];
}

interface Marcjs {
  Record: new () => MarcjsRecord;
  Marc: { parse(raw: string, type: 'marcxml'): MarcjsRecord; format(record: MarcjsRecord, type: 'marcxml'): string };
}

// eslint-disable-next-line @typescript-eslint/no-require-imports
const marcjs = require('marcjs') as Marcjs;

/** A record built by marcjs from fields in its own shape, written as MARCXML by marcjs. */
export function marcjsXml(leader: string, fields: readonly (readonly string[])[]): string {
  const record = new marcjs.Record();
  record.leader = leader;
  record.fields = fields.map((field) => [...field]);
  return `<collection xmlns="http://www.loc.gov/MARC21/slim">${marcjs.Marc.format(record, 'marcxml')}</collection>`;
}

/** marcjs's reading of one MARCXML record (unprefixed, as marcjs expects). */
export function marcjsRead(xml: string): MarcjsRecord {
  return marcjs.Marc.parse(xml, 'marcxml');
}
