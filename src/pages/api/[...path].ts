import { NotFoundError } from '../../lib/errors';
import { endpoint } from '../../lib/http/endpoint';

/** Any /api/* path without a route: a JSON 404, never an HTML page. */
export const ALL = endpoint({ access: ['anyone'] }, ({ url, request }) => {
  throw new NotFoundError(`No API route answers ${request.method} ${url.pathname}. See README.md for the API map.`);
});
