import { getAggregate, getPoints, getVariant, getVariants, getVariantsCsv } from '../controllers/variants.controller';
import { ApiRouter } from '../http/api-router';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';

const FILTERS = 'Filters: status=a,b; critical=true|false; marked=candidate|rejected; ids=i,j,... (up to 2,000 indices); '
  + 'f.<field>.gte=x and f.<field>.lte=x on numeric fields (index, k, s, peakTension, peakCompression, maxDisplacement, '
  + 'spanOverDeflection, weight, maxUtilisation, and the parameters in the run\'s paramColumns). Unknown keys or fields: 422.';
const run = '/projects/:slug/runs/:runId';

export function variantsRoutes(): ApiRouter {
  const read = [authenticate, requireRight('project:read')];
  return new ApiRouter('variants')
    .get(`${run}/variants`, { summary: 'A page of variants, each with its marks', description: `page, pageSize (≤ 500), sort=field|-field (nulls sort lowest). ${FILTERS}` }, ...read, getVariants)
    .get(`${run}/variants.csv`, { summary: 'The variants of the same query as CSV (streamed)', description: `sort=field|-field. ${FILTERS}` }, ...read, getVariantsCsv)
    .get(`${run}/points`, { summary: 'Columnar x, y (and color) of every variant, for scatter charts', description: `x, y, color: numeric fields; limit (≤ 200,000), in index order. ${FILTERS}` }, ...read, getPoints)
    .get(`${run}/aggregate`, { summary: 'Counts and min/max of y (or of z) in x × y bins, computed in SQL', description: `x, y, z: numeric fields; bins (≤ 200) per axis. ${FILTERS}` }, ...read, getAggregate)
    .get(`${run}/variants/:index`, 'One variant: its model rebuilt and analysed again, the pushed figures checked', ...read, getVariant);
}
