import { STAFF } from '../../../lib/auth/actor';
import { schoolDirectory } from '../../../lib/db/school-directory';
import { endpoint } from '../../../lib/http/endpoint';
import { queryObject } from '../../../lib/reach/reach-query';
import { SchoolDirectoryQuerySchema } from '../../../lib/reach/school-schema';
import { parseInput } from '../../../lib/validation';

/** The schools directory with every field, filtered and paged (coordinators and admins). */
export const GET = endpoint({ access: STAFF }, async ({ url }) => {
  const q = parseInput(SchoolDirectoryQuerySchema, queryObject(url.searchParams), 'directory query');
  return { ...(await schoolDirectory(q)), page: q.page, pageSize: q.pageSize };
});
