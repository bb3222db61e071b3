import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';

import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';

import type { CaughtMail } from '../../../shared/api/admin';
import { writeCaughtMail } from './caught-mail';

/**
 * A local SMTP inbox for development and tests: accepts every message on loopback, parses it,
 * keeps it in memory and (given a folder) writes it where the server's admin mail page reads.
 * Never used in production, where SMTP_URL names a real relay.
 */
export class DevInbox {
  private readonly caught: CaughtMail[] = [];
  private readonly waiters = new Set<() => void>();
  private readonly server: SMTPServer;

  constructor(private readonly dir: string | null = null) {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      logger: false,
      onData: (stream, _session, callback) => {
        simpleParser(stream)
          .then(async (parsed) => {
            const mail: CaughtMail = {
              id: randomUUID(),
              receivedAt: new Date().toISOString(),
              from: parsed.from?.text ?? '',
              to: addresses(parsed.to),
              subject: parsed.subject ?? '',
              text: parsed.text ?? '',
              ...(typeof parsed.html === 'string' ? { html: parsed.html } : {}),
              ...listUnsubscribe(parsed.headerLines),
            };
            this.caught.push(mail);
            if (this.dir) await writeCaughtMail(this.dir, mail);
            for (const wake of this.waiters) wake();
            callback();
          })
          .catch((err: Error) => callback(err));
      },
    });
  }

  /** Listens on 127.0.0.1; port 0 picks a free one. Resolves with the port. */
  listen(port: number): Promise<number> {
    return new Promise((resolve, reject) => {
      this.server.once('error', reject);
      this.server.listen(port, '127.0.0.1', () => resolve((this.server.server.address() as AddressInfo).port));
    });
  }

  close(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }

  messages(): readonly CaughtMail[] {
    return this.caught;
  }

  /** The first message (caught already or arriving within `timeoutMs`) that matches. */
  waitFor(match: (mail: CaughtMail) => boolean, timeoutMs = 5000): Promise<CaughtMail> {
    return new Promise((resolve, reject) => {
      const check = () => {
        const found = this.caught.find(match);
        if (!found) return;
        cleanup();
        resolve(found);
      };
      const timer = setTimeout(() => {
        cleanup();
        reject(new Error('No matching mail arrived in the inbox'));
      }, timeoutMs);
      const cleanup = () => {
        clearTimeout(timer);
        this.waiters.delete(check);
      };
      this.waiters.add(check);
      check();
    });
  }
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((group) => group.value.map((entry) => entry.address ?? '')).filter(Boolean);
}

/** The raw List-Unsubscribe header, if any (mailparser folds List-* headers into an object of its own). */
function listUnsubscribe(lines: readonly { key: string; line: string }[]): { listUnsubscribe?: string } {
  const line = lines.find((header) => header.key === 'list-unsubscribe')?.line;
  return line ? { listUnsubscribe: line.slice(line.indexOf(':') + 1).trim() } : {};
}
