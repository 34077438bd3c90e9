import { STAFF } from '../../../lib/auth/actor';
import { endpoint } from '../../../lib/http/endpoint';
import { reachFigure } from '../../../lib/reach/figures';
import { reachRowsPage } from '../../../lib/reach/reach-data.server';
import { queryObject, ReachRowsQuerySchema } from '../../../lib/reach/reach-query';
import { parseInput } from '../../../lib/validation';

/** The drill-down: what one figure counts in the period, each unit once, newest first, paged. */
export const GET = endpoint({ access: STAFF }, async ({ url }) => {
  const q = parseInput(ReachRowsQuerySchema, queryObject(url.searchParams), 'drill-down query');
  const { rows, total } = await reachRowsPage(q);
  const figure = reachFigure(q.figure);
  return { figure: { id: figure.id, label: figure.label, amountLabel: figure.amountLabel ?? null }, rows, total };
});
