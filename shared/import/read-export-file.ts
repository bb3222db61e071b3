import { EXPORT_FORMAT, EXPORT_VERSION, type LamplightExport } from '../export/export-format';

/** The largest file an import reads (a 10,000-book journal is a few MB). */
export const MAX_IMPORT_BYTES = 50 * 1024 * 1024;

export type ReadExport = { readonly file: LamplightExport } | { readonly problem: string };

const isObject = (value: unknown): value is Record<string, unknown> => typeof value === 'object' && value !== null && !Array.isArray(value);

/**
 * Reads a file's text as a Lamplight export, or says in a sentence why it is not one. Only the
 * envelope is checked here; every row is checked on its own as it is imported.
 */
export function readExportFile(text: string): ReadExport {
  let parsed: unknown;
  try {
    parsed = JSON.parse(text.replace(/^\uFEFF/, ''));
  } catch {
    return { problem: 'This file is not JSON, so it is not a Lamplight export. Nothing was changed.' };
  }
  if (!isObject(parsed) || parsed['format'] !== EXPORT_FORMAT) {
    return { problem: 'This JSON file is not a Lamplight export (it has no "format": "lamplight-export"). Nothing was changed.' };
  }
  const version = parsed['version'];
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    return { problem: 'This export has no version we can read. Nothing was changed.' };
  }
  if (version > EXPORT_VERSION) {
    return {
      problem: `This export was made by a newer Lamplight (file version ${version}; this app reads ${EXPORT_VERSION}). Update the app, then import it. Nothing was changed.`,
    };
  }
  if (!isObject(parsed['collections'])) return { problem: 'This export holds no collections. Nothing was changed.' };
  return { file: parsed as unknown as LamplightExport };
}
