import { deterministicId } from './deterministic-id';

describe('deterministicId', () => {
  it('gives the same lower-case version-5 UUID for the same kind and key, and different ones otherwise', () => {
    const march = deterministicId('month-pick', '2026-03');
    expect(deterministicId('month-pick', '2026-03')).toBe(march);
    expect(deterministicId('month-pick', '2026-04')).not.toBe(march);
    expect(deterministicId('label', '2026-03')).not.toBe(march);
    // Fixed values from an independent UUIDv5 implementation, Python 3's
    // uuid.uuid5(UUID('4b0c8f3e-6d1a-4e57-9a55-2f7c1e0b9d64'), 'month-pick:2026-03'): an id
    // that changed would split every reader's synced rows in two.
    expect(march).toBe('67cca4fd-2a03-5bd8-9fdb-b27c3903e16f');
    expect(deterministicId('label', 'to-read')).toBe('aba0c8b1-a3fb-5b53-a945-fdc8ec722e3a');
    expect(march).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-5[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
  });
});
