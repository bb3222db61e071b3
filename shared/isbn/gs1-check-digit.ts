/**
 * The GS1 modulo-10 check digit for the digits before it (GS1 General Specifications §7.9.1):
 * weights 3 and 1 alternate starting with 3 at the digit next to the check digit, so one
 * function serves GTIN-8, -12, -13 and -14. An ISBN-13 is a GTIN-13, so it uses this too.
 * Returns null when the body is empty or not all digits.
 *
 * @example
 * gs1CheckDigit('629104150021') // 3
 * gs1CheckDigit('978084361072') // 7
 */
export function gs1CheckDigit(body: string): number | null {
  if (!/^\d+$/.test(body)) return null;
  let sum = 0;
  // Counting from the right keeps the weights right whatever the length of the GTIN.
  for (let fromRight = 0; fromRight < body.length; fromRight++) {
    const digit = Number(body[body.length - 1 - fromRight]);
    sum += fromRight % 2 === 0 ? 3 * digit : digit;
  }
  return (10 - (sum % 10)) % 10;
}
