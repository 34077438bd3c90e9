import { STAFF } from '../../../lib/auth/actor';
import { schoolDirectory } from '../../../lib/db/school-directory';
import { endpoint } from '../../../lib/http/endpoint';
import { csvResponse } from '../../../lib/reach/csv-response';
import { schoolDirectoryCsv } from '../../../lib/reach/reach-csv';
import { queryObject } from '../../../lib/reach/reach-query';
import { SchoolDirectoryQuerySchema } from '../../../lib/reach/school-schema';
import { parseInput } from '../../../lib/validation';

/** The schools directory as CSV: every school under the same filters and order as the page (all pages). */
export const GET = endpoint({ access: STAFF }, async ({ url }) => {
  const q = parseInput(SchoolDirectoryQuerySchema, queryObject(url.searchParams), 'directory query');
  const { schools } = await schoolDirectory(q, true);
  return csvResponse(schoolDirectoryCsv(schools), 'schools.csv');
});
