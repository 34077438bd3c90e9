import { STAFF } from '../../../lib/auth/actor';
import { actorUser } from '../../../lib/auth/actor-require';
import { schoolPeople, schoolRecordById, schoolUpdate } from '../../../lib/db/school-directory';
import { NotFoundError } from '../../../lib/errors';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { SchoolUpdateSchema } from '../../../lib/reach/school-schema';
import { parseInput } from '../../../lib/validation';
import { schoolIdParam } from './_school-id';
import { BODY_BYTES_LONG_FORM } from '../../../lib/http/body-limits';

/** One school with its teachers, classes and events (coordinators and admins). */
export const GET = endpoint({ access: STAFF }, async ({ params }) => {
  const id = schoolIdParam(params.id);
  const school = await schoolRecordById(id);
  if (!school) throw new NotFoundError('No school with that id.');
  return { school, ...(await schoolPeople(id)) };
});

/** Edits a school, or accepts a proposed one with { status: "approved" }. */
export const PATCH = endpoint({ access: STAFF }, async (context) => {
  const id = schoolIdParam(context.params.id);
  const input = parseInput(SchoolUpdateSchema, await readJson(context.request, BODY_BYTES_LONG_FORM), 'school change');
  return { school: await schoolUpdate(id, input, actorUser(context.locals.actor).userId) };
});
