import { z } from 'zod';
import { NotFoundError } from '../../../lib/errors';

const Uuid = z.string().uuid();

/** The school id of the URL; a malformed one is a school that does not exist (404). */
export function schoolIdParam(id: string | undefined): string {
  if (!Uuid.safeParse(id).success) throw new NotFoundError('No school with that id.');
  return id!;
}
