import { NotFoundError } from '../../../lib/errors';
import { endpoint } from '../../../lib/http/endpoint';
import { serverConfig } from '../../../lib/server-config';

/**
 * Throws an unexpected error so tests can check the JSON 500 and its logged request id. Exists only when the
 * server runs with KW_TEST_ROUTES=1 (npm test); everywhere else it answers 404 like any unknown route.
 */
export const GET = endpoint({ access: ['anyone'] }, ({ url }) => {
  if (serverConfig('KW_TEST_ROUTES') !== '1') throw new NotFoundError(`No API route answers GET ${url.pathname}.`);
  throw new Error('deliberate failure for the error-handling test');
});
