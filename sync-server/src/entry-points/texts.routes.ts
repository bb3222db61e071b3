import { Router } from 'express';
import type { DataSource } from 'typeorm';
import * as z from 'zod';

import type { TextVersionsResponse } from '../../../shared/api/text-history';
import { textFieldMax } from '../../../shared/text/text-fields';
import { queryableOf, TextStore } from '../data-access/text-store';
import { AppError } from '../errors';
import { parseInput } from './parse-input';
import { callerOf } from './require-auth';

const params = z.object({
  collection: z.string().max(40),
  rowId: z.string().regex(/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/, 'must be a row id (lower-case UUID)'),
  field: z.string().max(40),
});

/** `/api/texts` (behind requireAuth): a mergeable text's history. */
export function textsRoutes(dataSource: DataSource): Router {
  const router = Router();

  router.get('/:collection/:rowId/:field/versions', async (req, res) => {
    const { collection, rowId, field } = parseInput(params, req.params);
    if (textFieldMax(collection, field) === undefined) {
      throw new AppError(404, 'not_found', `${collection}.${field} is not a text with a history`);
    }
    const body: TextVersionsResponse = { versions: await TextStore.versions(queryableOf(dataSource), callerOf(res).userId, collection, rowId, field) };
    res.json(body);
  });

  return router;
}
