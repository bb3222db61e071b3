/**
 * The ISBN-10 check character for a 9-digit body (ISO 2108, modulus 11 with weights 10 to 2).
 * A remainder that asks for 10 is written 'X'. Returns null when the body is not 9 digits.
 *
 * @example
 * isbn10CheckDigit('084361072') // '7'
 * isbn10CheckDigit('080442957') // 'X'
 */
export function isbn10CheckDigit(body: string): string | null {
  if (!/^\d{9}$/.test(body)) return null;
  let sum = 0;
  for (let i = 0; i < 9; i++) sum += (10 - i) * Number(body[i]);
  const check = (11 - (sum % 11)) % 11;
  return check === 10 ? 'X' : String(check);
}
