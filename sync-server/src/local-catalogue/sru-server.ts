import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';

import express, { type Express } from 'express';

import { normalizeIsbn } from '../../../shared/isbn/normalize-isbn';
import { CqlSyntaxError, parseCql, type CqlNode } from './cql-query';
import { inventedRecords } from './invented-records';
import { escapeXml, toMarcXml, type LocalRecord } from './marc-fields';

const SRU = 'http://docs.oasis-open.org/ns/search-ws/sruResponse';
const DIAG = 'http://docs.oasis-open.org/ns/search-ws/diagnostic';
const MARCXML_SCHEMAS = new Set(['marcxml', 'marc21', 'info:srw/schema/1/marcxml-v1.1', 'http://www.loc.gov/marc21/slim']);
const MAX_RECORDS = 50;

const fold = (text: string) => text.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase();
const words = (text: string) => fold(text).match(/[\p{L}\p{N}]+/gu) ?? [];

/** What a record is found by: its ISBNs (as ISBN-13), the words of its title and of its names. */
interface Indexed {
  readonly record: LocalRecord;
  readonly isbns: ReadonlySet<string>;
  readonly title: readonly string[];
  readonly creators: readonly (readonly string[])[];
}

function indexRecord(record: LocalRecord): Indexed {
  const values = (tag: string, codes: string) =>
    record.fields
      .filter((field) => field[0] === tag)
      .map((field) => {
        const parts: string[] = [];
        for (let i = 2; i + 1 < field.length; i += 2) if (codes.includes(field[i]!)) parts.push(field[i + 1]!);
        return parts.join(' ');
      });
  const isbns = values('020', 'a').map((value) => normalizeIsbn(/^\s*([0-9][0-9\- ]*[0-9Xx])/.exec(value)?.[1] ?? ''));
  return {
    record,
    isbns: new Set(isbns.filter((isbn): isbn is string => isbn !== null)),
    title: words(values('245', 'ab').join(' ')),
    creators: [...values('100', 'a'), ...values('700', 'a')].map(words),
  };
}

class UnsupportedIndex extends Error {}

function containsPhrase(haystack: readonly string[], needle: readonly string[]): boolean {
  if (needle.length === 0) return false;
  return haystack.some((_, start) => needle.every((word, i) => haystack[start + i] === word));
}

function matchesWords(field: readonly string[], relation: string, term: string): boolean {
  const wanted = words(term.replace(/[*?^]/g, ''));
  if (wanted.length === 0) return false;
  if (relation === 'any') return wanted.some((word) => field.includes(word));
  if (relation === 'all') return wanted.every((word) => field.includes(word));
  if (relation === '==' || relation === 'exact') return wanted.join(' ') === field.join(' ');
  return containsPhrase(field, wanted);
}

function matches(node: CqlNode, entry: Indexed): boolean {
  if (node.kind === 'boolean') {
    const left = matches(node.left, entry);
    if (node.op === 'and') return left && matches(node.right, entry);
    if (node.op === 'or') return left || matches(node.right, entry);
    return left && !matches(node.right, entry);
  }
  // Names match in either order ("Juniper Asquith" finds "Asquith, Juniper"), so all words count.
  const creator = (relation: string) => entry.creators.some((name) => matchesWords(name, relation === 'any' ? 'any' : 'all', node.term));
  switch (node.index) {
    case 'bath.isbn':
    case 'dc.identifier': {
      const isbn = normalizeIsbn(node.term);
      return isbn !== null && entry.isbns.has(isbn);
    }
    case 'dc.title':
    case 'bath.title':
      return matchesWords(entry.title, node.relation, node.term);
    case 'dc.creator':
    case 'bath.name':
    case 'bath.author':
      return creator(node.relation);
    case 'cql.serverchoice':
    case 'cql.anywhere':
      return matchesWords(entry.title, node.relation, node.term) || creator(node.relation);
    default:
      throw new UnsupportedIndex(node.index);
  }
}

function diagnosticResponse(number: number, message: string, details: string): string {
  return `<?xml version="1.0" encoding="UTF-8"?>
<sru:searchRetrieveResponse xmlns:sru="${SRU}">
<sru:version>2.0</sru:version>
<sru:numberOfRecords>0</sru:numberOfRecords>
<sru:diagnostics><diag:diagnostic xmlns:diag="${DIAG}"><diag:uri>info:srw/diagnostic/1/${number}</diag:uri><diag:details>${escapeXml(details)}</diag:details><diag:message>${escapeXml(message)}</diag:message></diag:diagnostic></sru:diagnostics>
</sru:searchRetrieveResponse>`;
}

function recordsResponse(found: readonly Indexed[], start: number, maximum: number, escaping: 'xml' | 'string'): string {
  const page = found.slice(start - 1, start - 1 + maximum);
  const records = page.map((entry, i) => {
    const marc = toMarcXml(entry.record);
    return `<sru:record><sru:recordSchema>info:srw/schema/1/marcxml-v1.1</sru:recordSchema><sru:recordXMLEscaping>${escaping}</sru:recordXMLEscaping><sru:recordData>${escaping === 'string' ? escapeXml(marc) : marc}</sru:recordData><sru:recordPosition>${start + i}</sru:recordPosition></sru:record>`;
  });
  const next = start + page.length <= found.length ? `\n<sru:nextRecordPosition>${start + page.length}</sru:nextRecordPosition>` : '';
  return `<?xml version="1.0" encoding="UTF-8"?>
<sru:searchRetrieveResponse xmlns:sru="${SRU}">
<sru:version>2.0</sru:version>
<sru:numberOfRecords>${found.length}</sru:numberOfRecords>
<sru:records>${records.join('\n')}</sru:records>${next}
</sru:searchRetrieveResponse>`;
}

const whole = (value: unknown, fallback: number) => (value === undefined ? fallback : /^\d+$/.test(String(value)) ? Number(value) : NaN);

/**
 * The local catalogue: an SRU 2.0 searchRetrieve endpoint at `/sru` over invented MARC 21
 * records, so look-ups work on a machine with no network. Errors are SRU diagnostics
 * (info:srw/diagnostic/1/…, "SRU Diagnostics List"), sent with status 200 as SRU servers do.
 */
export function createLocalCatalogue(records: readonly LocalRecord[] = inventedRecords()): Express {
  const indexed = records.map(indexRecord);
  const app = express();
  app.disable('x-powered-by');
  app.get('/sru', (req, res) => {
    res.type('application/sru+xml; charset=utf-8');
    const query = typeof req.query['query'] === 'string' ? req.query['query'] : '';
    const schema = typeof req.query['recordSchema'] === 'string' ? req.query['recordSchema'] : 'marcxml';
    const maximum = whole(req.query['maximumRecords'], 10);
    const start = whole(req.query['startRecord'], 1);
    if (!query.trim()) return void res.send(diagnosticResponse(7, 'Mandatory parameter not supplied', 'query'));
    if (!MARCXML_SCHEMAS.has(schema.toLowerCase())) return void res.send(diagnosticResponse(66, 'Unknown schema for retrieval', schema));
    if (!(maximum >= 0 && maximum <= MAX_RECORDS))
      return void res.send(diagnosticResponse(6, 'Unsupported parameter value', `maximumRecords must be 0 to ${MAX_RECORDS}`));
    if (!(start >= 1)) return void res.send(diagnosticResponse(6, 'Unsupported parameter value', 'startRecord must be 1 or more'));
    try {
      const tree = parseCql(query);
      const found = indexed.filter((entry) => matches(tree, entry));
      res.send(recordsResponse(found, start, maximum, req.query['recordXMLEscaping'] === 'string' ? 'string' : 'xml'));
    } catch (error) {
      if (error instanceof CqlSyntaxError) return void res.send(diagnosticResponse(10, 'Query syntax error', error.message));
      if (error instanceof UnsupportedIndex) return void res.send(diagnosticResponse(16, 'Unsupported index', error.message));
      throw error;
    }
  });
  return app;
}

export interface RunningCatalogue {
  /** The SRU base URL, e.g. http://127.0.0.1:41500/sru */
  readonly url: string;
  close(): Promise<void>;
}

/** Listens on loopback (`port` 0 picks a free one). */
export async function startLocalCatalogue(port = 0, host = '127.0.0.1'): Promise<RunningCatalogue> {
  const app = createLocalCatalogue();
  const server: Server = await new Promise((resolve, reject) => {
    const listening = app.listen(port, host, () => resolve(listening));
    listening.on('error', reject);
  });
  const address = server.address() as AddressInfo;
  return {
    url: `http://${host}:${address.port}/sru`,
    close: () =>
      new Promise((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}
