import { XMLParser } from 'fast-xml-parser';

/**
 * A MARC 21 record as MARCXML carries it (the Library of Congress MARCXML schema): the leader,
 * control fields 001–009 as plain values, data fields with two indicators and coded subfields,
 * all in the record's order.
 */
export interface MarcRecord {
  readonly leader: string;
  readonly controlFields: readonly { readonly tag: string; readonly value: string }[];
  readonly dataFields: readonly MarcDataField[];
}

export interface MarcDataField {
  readonly tag: string;
  readonly ind1: string;
  readonly ind2: string;
  readonly subfields: readonly { readonly code: string; readonly value: string }[];
}

/** Element names that may repeat, read as arrays even when there is one. */
const REPEATED = new Set(['record', 'controlfield', 'datafield', 'subfield', 'diagnostic']);

/**
 * One parser for MARCXML and SRU responses. Namespace prefixes are dropped (catalogues use
 * `marc:`, `zs:`, `srw:` or none); values stay text (an ISBN is not a number); no entity is
 * ever fetched (fast-xml-parser does not resolve external entities).
 */
export function createXmlParser(): XMLParser {
  return new XMLParser({
    ignoreAttributes: false,
    attributeNamePrefix: '@_',
    removeNSPrefix: true,
    parseTagValue: false,
    parseAttributeValue: false,
    ignoreDeclaration: true,
    ignorePiTags: true,
    // Numeric character references (&#38;) are XML too; the named HTML ones are harmless extras.
    htmlEntities: true,
    isArray: (name) => REPEATED.has(name),
  });
}

type XmlNode = Record<string, unknown>;

const asNodes = (value: unknown): XmlNode[] =>
  (Array.isArray(value) ? value : value == null ? [] : [value]).map((item) => (typeof item === 'object' && item ? (item as XmlNode) : { '#text': item }));
/** Control characters and lone surrogates (a character reference can smuggle them in): PostgreSQL refuses NUL. */
const UNSTORABLE = /[\u0000-\u0008\u000B\u000C\u000E-\u001F]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

/** An element's text: a bare string, or `#text` beside attributes, without unstorable characters. */
export const textOf = (node: unknown): string => {
  if (node == null) return '';
  const text = typeof node !== 'object' ? node : (node as XmlNode)['#text'];
  return text == null ? '' : String(text).replace(UNSTORABLE, '');
};
const attribute = (node: XmlNode, name: string) => String(node[`@_${name}`] ?? '');

/** Whether a parsed element is a MARC record (has a leader or fields), not some other XML. */
export function looksLikeMarcRecord(node: unknown): node is XmlNode {
  return typeof node === 'object' && node !== null && ('leader' in node || 'datafield' in node || 'controlfield' in node);
}

/** Reads one parsed `<record>` element. Indicators and codes are kept as written (blank is ' '). */
export function readMarcRecord(node: XmlNode): MarcRecord {
  return {
    leader: textOf(node['leader']),
    controlFields: asNodes(node['controlfield']).map((field) => ({ tag: attribute(field, 'tag'), value: textOf(field) })),
    dataFields: asNodes(node['datafield']).map((field) => ({
      tag: attribute(field, 'tag'),
      ind1: attribute(field, 'ind1') || ' ',
      ind2: attribute(field, 'ind2') || ' ',
      subfields: asNodes(field['subfield']).map((subfield) => ({ code: attribute(subfield, 'code'), value: textOf(subfield) })),
    })),
  };
}

/** Every record of a MARCXML document (a `<collection>` or a single `<record>`). */
export function parseMarcXml(xml: string): MarcRecord[] {
  const document = createXmlParser().parse(xml) as XmlNode;
  const collection = document['collection'] as XmlNode | undefined;
  const records = collection ? asNodes(collection['record']) : asNodes(document['record']);
  return records.filter(looksLikeMarcRecord).map(readMarcRecord);
}

/** The values of subfield `code` in every field `tag`, in order. */
export function subfieldValues(record: MarcRecord, tag: string, code: string): string[] {
  return record.dataFields.filter((field) => field.tag === tag).flatMap((field) => field.subfields.filter((s) => s.code === code).map((s) => s.value));
}

/** The first value of subfield `code` in a field. */
export function subfield(field: MarcDataField, code: string): string | undefined {
  return field.subfields.find((s) => s.code === code)?.value;
}

export function controlField(record: MarcRecord, tag: string): string | undefined {
  return record.controlFields.find((field) => field.tag === tag)?.value;
}
