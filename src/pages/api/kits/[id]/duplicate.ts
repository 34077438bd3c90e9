import { z } from 'zod';
import { KitTitleSchema } from '../../../../lib/kit/kit-settings';
import { siteUrl } from '../../../../lib/auth/site-url';
import { readJson, json } from '../../../../lib/http/respond';
import { kitDuplicate, kitOwnedOrThrow, kitView, kitVisible } from '../../../../lib/kit/saved-kit.server';
import { endpoint } from '../../../../lib/http/endpoint';
import { parseInput } from '../../../../lib/validation';
import { BODY_BYTES_FORM } from '../../../../lib/http/body-limits';

const KitDuplicateSchema = z.object({
  /** Another of the teacher's classes; the same class when left out. */
  classId: z.string().uuid('classId must be the id of one of your classes').optional(),
  title: KitTitleSchema.optional(),
});

/** Copies a kit (its teacher only), with its own id and QR code. The body is optional. */
export const POST = endpoint({ access: ['teacher'] }, async (context) => {
  const row = await kitOwnedOrThrow(context.locals.actor, context.params.id ?? '');
  const hasBody = (context.request.headers.get('content-length') ?? '0') !== '0';
  const input = parseInput(
    KitDuplicateSchema,
    hasBody ? await readJson(context.request, BODY_BYTES_FORM) : {},
    'duplicate',
  );
  const id = await kitDuplicate(context.locals.actor, row, siteUrl(context.url), input.classId, input.title);
  return json({ kit: kitView(await kitVisible(context.locals.actor, id)) }, 201);
});
