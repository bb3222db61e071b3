/** Bench books on the server: pushed through the wire contract, as another device would. */
import type { FieldChange } from '../../shared/api/sync';
import { MAX_PUSH_CHANGES } from '../../shared/api/sync';
import { HlcClock } from '../../shared/sync/hlc';
import type { SyncClient } from '../../spec/support/sync-client';
import { benchBooks } from './seed-books';

/** `count` invented books as field changes, pushed in batches of the contract's largest size. */
export async function seedServerBooks(client: SyncClient, count: number): Promise<void> {
  const clock = new HlcClock('bench-seeder');
  const changes: FieldChange[] = benchBooks(count).flatMap((book) => {
    const hlc = clock.tick();
    return Object.entries(book)
      .filter(([field]) => field !== 'id' && field !== '_hlc')
      .map(([field, value]) => ({ id: crypto.randomUUID(), collection: 'books', rowId: String(book['id']), field, value, hlc }));
  });
  for (let i = 0; i < changes.length; i += MAX_PUSH_CHANGES) {
    const { status } = await client.push(changes.slice(i, i + MAX_PUSH_CHANGES));
    if (status !== 200) throw new Error(`seeding push answered ${status}`);
  }
}
