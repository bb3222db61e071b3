import { isValidEan13 } from './is-valid-ean13';

describe('isValidEan13', () => {
  it("accepts GS1's worked example 629104150021 3", () => {
    // GS1 General Specifications §7.9.1 check digit example (from memory; also on GS1 Hong Kong's
    // check digit calculator page).
    expect(isValidEan13('6291041500213')).toBeTrue();
  });

  it('accepts the Wikipedia EAN-13 example 4006381333931 (from memory)', () => {
    // Wikipedia "International Article Number": 4+0+0+18+3+24+1+9+3+9+9+9 = 89; 90 − 89 = 1.
    expect(isValidEan13('4006381333931')).toBeTrue();
  });

  it("accepts a book's barcode, which is its ISBN-13", () => {
    // ISBN Users' Manual: the ISBN-13 is carried in an EAN-13 barcode.
    expect(isValidEan13('9789295055124')).toBeTrue();
  });

  it('ignores the newline a scanner sends but nothing inside the digits', () => {
    expect(isValidEan13('6291041500213\n')).toBeTrue();
    expect(isValidEan13('629104 1500213')).toBeFalse();
  });

  it('rejects a wrong check digit and a wrong length', () => {
    expect(isValidEan13('6291041500214')).toBeFalse();
    expect(isValidEan13('4006381333930')).toBeFalse();
    expect(isValidEan13('629104150021')).toBeFalse();
    expect(isValidEan13('62910415002130')).toBeFalse();
  });
});
