import { sha256Hex, toHex } from './sha256-hex';

describe('sha256Hex', () => {
  const text = (value: string) => new TextEncoder().encode(value);

  it('matches the one-block example of FIPS 180-4 (NIST CSRC example values, SHA256.pdf): "abc"', async () => {
    expect(await sha256Hex(text('abc'))).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  it('matches the two-block example of the same NIST examples', async () => {
    expect(await sha256Hex(text('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq'))).toBe(
      '248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1',
    );
  });

  it('reads a Blob the same as its bytes, and the empty input as the well-known empty digest', async () => {
    expect(await sha256Hex(new Blob(['abc']))).toBe(await sha256Hex(text('abc')));
    // SHA-256 of zero bytes, as printed by GNU coreutils `sha256sum /dev/null`.
    expect(await sha256Hex(new Uint8Array())).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
  });

  it('writes two lower-case digits a byte, keeping leading zeros', () => {
    expect(toHex(new Uint8Array([0, 1, 0x0f, 0xa0, 0xff]))).toBe('00010fa0ff');
  });
});
