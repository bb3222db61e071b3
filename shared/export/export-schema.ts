// The mini build, as the schema's own validators (shared/sync/schema/field.ts): one zod in the app.
import * as z from 'zod/mini';

import { COLLECTIONS } from '../sync/schema/collections';
import type { FieldSpec } from '../sync/schema/field';
import { coversSchema } from './export-covers';
import { EXPORT_FORMAT, EXPORT_VERSION } from './export-format';

type JsonSchema = Record<string, unknown>;

/** A clock as `shared/sync/hlc.ts` writes it. */
const CLOCK = { type: 'string', pattern: '^\\d{15}:\\d{5}:[A-Za-z0-9-]{1,64}$' };

/** One field's values, from its zod validator (zod 4's own JSON Schema output, draft 2020-12). */
function fieldSchema(spec: FieldSpec): JsonSchema {
  const schema = z.toJSONSchema(spec.schema, { target: 'draft-2020-12', unrepresentable: 'any' }) as JsonSchema;
  delete schema['$schema'];
  return schema;
}

function rowSchema(fields: Readonly<Record<string, FieldSpec>>): JsonSchema {
  const names = Object.keys(fields);
  return {
    type: 'object',
    required: ['id', 'fields', 'clocks'],
    additionalProperties: false,
    properties: {
      id: { type: 'string', minLength: 1, maxLength: 64 },
      fields: {
        type: 'object',
        additionalProperties: false,
        properties: Object.fromEntries(names.map((name) => [name, fieldSchema(fields[name]!)])),
      },
      clocks: { type: 'object', propertyNames: { enum: names }, additionalProperties: CLOCK },
    },
  };
}

/**
 * The JSON Schema (draft 2020-12) of a Lamplight export file, built from the shared schema of
 * every synced collection so it never drifts from what the app stores. Published for anyone who
 * reads our files; `export-schema.spec.ts` validates exports against it with Ajv.
 */
export function lamplightExportSchema(): JsonSchema {
  const names = Object.keys(COLLECTIONS) as (keyof typeof COLLECTIONS)[];
  return {
    $schema: 'https://json-schema.org/draft/2020-12/schema',
    $id: 'https://lamplight.invalid/schemas/lamplight-export-1.json',
    title: 'Lamplight export',
    description: "A reader's whole journal: every row of every collection, each field with its hybrid logical clock.",
    type: 'object',
    required: ['format', 'version', 'exportedAt', 'collections'],
    additionalProperties: false,
    properties: {
      format: { const: EXPORT_FORMAT },
      version: { const: EXPORT_VERSION },
      exportedAt: { type: 'string', pattern: '^\\d{4}-\\d{2}-\\d{2}T\\d{2}:\\d{2}:\\d{2}(\\.\\d{1,3})?Z$' },
      collections: {
        type: 'object',
        additionalProperties: false,
        properties: Object.fromEntries(names.map((name) => [name, { type: 'array', items: { $ref: `#/$defs/${name}` } }])),
      },
      covers: coversSchema(),
    },
    $defs: Object.fromEntries(names.map((name) => [name, rowSchema(COLLECTIONS[name].fields as Readonly<Record<string, FieldSpec>>)])),
  };
}
