import { STAFF } from '../../../../lib/auth/actor';
import { actorUser } from '../../../../lib/auth/actor-require';
import { schoolMerge } from '../../../../lib/db/school-directory';
import { endpoint } from '../../../../lib/http/endpoint';
import { readJson } from '../../../../lib/http/respond';
import { SchoolMergeSchema } from '../../../../lib/reach/school-schema';
import { parseInput } from '../../../../lib/validation';
import { schoolIdParam } from '../_school-id';
import { BODY_BYTES_ID } from '../../../../lib/http/body-limits';

/** Merges this school into { intoId }: its teachers, classes, kits and events move there; it is deleted. */
export const POST = endpoint({ access: STAFF }, async (context) => {
  const fromId = schoolIdParam(context.params.id);
  const { intoId } = parseInput(SchoolMergeSchema, await readJson(context.request, BODY_BYTES_ID), 'merge');
  return schoolMerge(fromId, intoId, actorUser(context.locals.actor).userId);
});
