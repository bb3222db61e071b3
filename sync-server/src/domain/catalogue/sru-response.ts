import { XMLValidator } from 'fast-xml-parser';

import { CatalogueError } from './catalogue-provider';
import { createXmlParser, looksLikeMarcRecord, parseMarcXml, readMarcRecord, textOf, type MarcRecord } from './marc-record';

type XmlNode = Record<string, unknown>;

export interface SruDiagnostic {
  readonly uri: string;
  readonly message: string;
  readonly details: string;
}

/** A searchRetrieve response: how many records matched, the MARC records sent, and diagnostics. */
export interface SruResult {
  readonly numberOfRecords: number;
  readonly records: MarcRecord[];
  readonly diagnostics: SruDiagnostic[];
}

const list = (value: unknown): unknown[] => (Array.isArray(value) ? value : value == null ? [] : [value]);

/**
 * Reads an SRU searchRetrieveResponse (SRU 2.0, OASIS searchRetrieve Part 3, and 1.1/1.2, whose
 * elements have the same names in another namespace). Records are taken from `recordData` as
 * XML or, when the server escaped them as a string, parsed again. Anything that is not such a
 * response is a `malformed` CatalogueError.
 */
export function readSruResponse(xml: string): SruResult {
  if (XMLValidator.validate(xml) !== true) throw new CatalogueError('malformed', 'The catalogue answered with text that is not well-formed XML');
  const document = createXmlParser().parse(xml) as XmlNode;
  const response = document['searchRetrieveResponse'] as XmlNode | undefined;
  if (!response || typeof response !== 'object') throw new CatalogueError('malformed', 'The catalogue answered with XML that is not an SRU response');

  const diagnostics = list((response['diagnostics'] as XmlNode | undefined)?.['diagnostic']).map((node) => {
    const diagnostic = (node ?? {}) as XmlNode;
    return { uri: textOf(diagnostic['uri']), message: textOf(diagnostic['message']), details: textOf(diagnostic['details']) };
  });
  const count = Number(textOf(response['numberOfRecords']));
  if (!Number.isInteger(count) || count < 0) {
    if (diagnostics.length > 0) return { numberOfRecords: 0, records: [], diagnostics };
    throw new CatalogueError('malformed', 'The catalogue’s answer has no number of records');
  }

  const records = list((response['records'] as XmlNode | undefined)?.['record']).flatMap((node) => {
    const data = ((node ?? {}) as XmlNode)['recordData'];
    if (typeof data === 'string') return safeParseMarc(data);
    const marc = list((data as XmlNode | undefined)?.['record']);
    return marc.filter(looksLikeMarcRecord).map(readMarcRecord);
  });
  if (count > 0 && records.length === 0 && diagnostics.length === 0) {
    throw new CatalogueError('malformed', 'The catalogue’s answer has no MARC records in it');
  }
  return { numberOfRecords: count, records, diagnostics };
}

function safeParseMarc(text: string): MarcRecord[] {
  if (XMLValidator.validate(text) !== true) throw new CatalogueError('malformed', 'A record in the catalogue’s answer is not well-formed XML');
  return parseMarcXml(text);
}
