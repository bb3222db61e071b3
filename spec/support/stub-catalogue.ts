import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';

/**
 * A stand-in for a remote library catalogue that misbehaves on purpose (slow, broken XML, SRU
 * diagnostics): the third-party service, not any part of Lamplight. It answers every request
 * with `body` (or what `body(url)` gives) after `delayMs` and counts the requests.
 */
export interface StubCatalogue {
  readonly url: string;
  readonly requests: URL[];
  close(): Promise<void>;
}

export async function startStubCatalogue(answer: { body: string | ((request: URL) => string); delayMs?: number; status?: number }): Promise<StubCatalogue> {
  const requests: URL[] = [];
  const server: Server = createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://stub');
    requests.push(url);
    setTimeout(() => {
      res.writeHead(answer.status ?? 200, { 'Content-Type': 'application/sru+xml; charset=utf-8' });
      res.end(typeof answer.body === 'function' ? answer.body(url) : answer.body);
    }, answer.delayMs ?? 0);
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}/sru`,
    requests,
    close: () =>
      new Promise((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}

const SRU = 'xmlns:sru="http://docs.oasis-open.org/ns/search-ws/sruResponse"';

/** An SRU 2.0 response with these MARCXML records (escaped as a string when asked). */
export function sruRecords(records: readonly string[], escaped = false): string {
  const data = (xml: string) => (escaped ? xml.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;') : xml);
  return `<?xml version="1.0"?><sru:searchRetrieveResponse ${SRU}><sru:version>2.0</sru:version><sru:numberOfRecords>${records.length}</sru:numberOfRecords><sru:records>${records
    .map(
      (xml, i) =>
        `<sru:record><sru:recordSchema>marcxml</sru:recordSchema><sru:recordData>${data(xml)}</sru:recordData><sru:recordPosition>${i + 1}</sru:recordPosition></sru:record>`,
    )
    .join('')}</sru:records></sru:searchRetrieveResponse>`;
}

/** An SRU 2.0 response carrying one diagnostic (OASIS searchRetrieve Part 3, "Diagnostics"). */
export function sruDiagnostic(number: number, message: string, details = ''): string {
  return `<?xml version="1.0"?><sru:searchRetrieveResponse ${SRU}><sru:version>2.0</sru:version><sru:numberOfRecords>0</sru:numberOfRecords><sru:diagnostics><diag:diagnostic xmlns:diag="http://docs.oasis-open.org/ns/search-ws/diagnostic"><diag:uri>info:srw/diagnostic/1/${number}</diag:uri><diag:details>${details}</diag:details><diag:message>${message}</diag:message></diag:diagnostic></sru:diagnostics></sru:searchRetrieveResponse>`;
}
