/**
 * Control characters and lone UTF-16 surrogates are not text a person types, and PostgreSQL
 * refuses NUL in text (SQLSTATE 22021), so names with them are refused here, with a reason.
 */
const NOT_PLAIN_TEXT = /[\u0000-\u001f\u007f]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;
export const PLAIN_TEXT_MESSAGE = 'Use letters, digits, spaces and punctuation only';
export const isPlainText = (value: string) => !NOT_PLAIN_TEXT.test(value);
