import fc from 'fast-check';
import { parse } from 'isbn3';
import { gs1CheckDigit } from './gs1-check-digit';
import { expectProperty } from '../testing/expect-property';

describe('gs1CheckDigit', () => {
  it("matches GS1's check digit example 629104150021 → 3", () => {
    // GS1 General Specifications §7.9.1 check digit calculation example (from memory; the same
    // worked example is on GS1 Hong Kong's check digit calculator page): weights 1,3,1,3,… from
    // the left for 12 digits give 6+6+9+3+0+12+1+15+0+0+2+3 = 57; 60 − 57 = 3.
    expect(gs1CheckDigit('629104150021')).toBe(3);
  });

  it("matches GS1 India's example 890400021003 → 7", () => {
    // GS1 India "How to calculate the check digit": (3+0+2+0+4+9)×3 + (0+1+0+0+0+8) = 63; 70 − 63 = 7.
    expect(gs1CheckDigit('890400021003')).toBe(7);
  });

  it("gives the ISBN-13 check digit of the ISBN Users' Manual example 978-92-95055-12-4", () => {
    // ISBN Users' Manual, ISBN-13 check digit example: 9+21+8+27+2+27+5+0+5+15+1+6 = 126; 130 − 126 = 4.
    expect(gs1CheckDigit('978929505512')).toBe(4);
  });

  it('weights from the right, so GTIN-8 and GTIN-14 work too', () => {
    // GS1 General Specifications §7.9.1: the digit next to the check digit always has weight 3.
    // UPC-A (GTIN-12) 036000291452, Wikipedia "Universal Product Code" example (from memory):
    // from the right 5×3+4+1×3+9+2×3+0+0×3+0+6×3+3+0×3 = 58; 60 − 58 = 2.
    expect(gs1CheckDigit('03600029145')).toBe(2);
    // GS1 left-pads shorter GTINs with zeros in 14-digit fields; that must not change the digit.
    expect(gs1CheckDigit('000' + '03600029145')).toBe(2);
    // GTIN-8 9638507: 7×3+0+5×3+8+3×3+6+9×3 = 86; 90 − 86 = 4 (worked by hand from §7.9.1).
    expect(gs1CheckDigit('9638507')).toBe(4);
  });

  it('agrees with isbn3 (npm reference) on random 978/979 bodies', () => {
    expectProperty(
      fc.property(fc.constantFrom('978', '979'), fc.stringMatching(/^\d{9}$/), (prefix, rest) => {
        const body = prefix + rest;
        const accepted = [...'0123456789'].filter((c) => parse(body + c) !== null);
        fc.pre(accepted.length > 0);
        return accepted.length === 1 && accepted[0] === String(gs1CheckDigit(body));
      }),
      { numRuns: 200 },
    );
  });

  it('refuses empty or non-digit bodies', () => {
    expect(gs1CheckDigit('')).toBeNull();
    expect(gs1CheckDigit('97808436107X')).toBeNull();
  });
});
