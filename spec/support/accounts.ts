import { randomUUID } from 'node:crypto';

import type { Express } from 'express';
import request from 'supertest';

import type { SignedIn } from '../../shared/api/auth';
import { testDataSource } from './test-database';

/** A password that passes the policy; invented words. */
export const GOOD_PASSWORD = 'amber lanterns over the quiet quay';

/** A unique, invented address for one spec. */
export function uniqueEmail(label = 'reader'): string {
  return `${label}-${randomUUID().slice(0, 8)}@example.com`;
}

/** Registers a new reader through the API and returns the 201 body. */
export async function registerReader(app: Express, fields: { email?: string; password?: string; displayName?: string; userAgent?: string } = {}): Promise<SignedIn> {
  const res = await request(app)
    .post('/api/auth/register')
    .set('User-Agent', fields.userAgent ?? 'Mozilla/5.0 (X11; Linux x86_64) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/125.0 Safari/537.36')
    .send({
      email: fields.email ?? uniqueEmail(),
      password: fields.password ?? GOOD_PASSWORD,
      displayName: fields.displayName ?? 'Ilse Varga',
    })
    .expect(201);
  return res.body as SignedIn;
}

/** Registers a reader and makes them an admin directly in the database. */
export async function registerAdmin(app: Express): Promise<SignedIn> {
  const signedIn = await registerReader(app, { email: uniqueEmail('admin'), displayName: 'Bram Okafor' });
  await (await testDataSource()).query(`UPDATE users SET role = 'admin' WHERE id = $1`, [signedIn.user.id]);
  return signedIn;
}

export const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
