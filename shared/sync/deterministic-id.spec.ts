import { v5 as uuidV5 } from 'uuid';

import { deterministicId } from './deterministic-id';

describe('deterministicId', () => {
  it('builds on the reference UUIDv5 implementation (RFC 9562 §A.4 example: DNS namespace, "www.example.com")', () => {
    // Test vector from RFC 9562 Appendix A.4 (quoted from memory, and it matches the uuid package).
    expect(uuidV5('www.example.com', '6ba7b810-9dad-11d1-80b4-00c04fd430c8')).toBe('2ed6657d-e927-568b-95e1-2665a8aea6a2');
  });

  it('gives the same lower-case version-5 UUID for the same kind and key, and different ones otherwise', () => {
    const march = deterministicId('month-pick', '2026-03');
    expect(deterministicId('month-pick', '2026-03')).toBe(march);
    expect(deterministicId('month-pick', '2026-04')).not.toBe(march);
    expect(deterministicId('label', '2026-03')).not.toBe(march);
    expect(march).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-5[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
  });
});
