import { ANY_ACCOUNT } from '../../../../lib/auth/actor';
import { buildPlanForEvent } from '../../../../lib/events/build-plan.server';
import { BuildPlanQuerySchema } from '../../../../lib/events/build-plan-query';
import { endpoint } from '../../../../lib/http/endpoint';
import { parseInput } from '../../../../lib/validation';

/**
 * The big-build plan packet of an event's kit (staff, and teachers with a confirmed place): ?venue=<preset> or
 * ?lengthM=&widthM= for another venue, ?scale=N for 1:N, ?paper=letter|a4.
 */
export const GET = endpoint({ access: ANY_ACCOUNT }, async ({ locals, params, url }) => {
  const query = parseInput(BuildPlanQuerySchema, Object.fromEntries(url.searchParams), 'plan query');
  const { bytes, fileName } = await buildPlanForEvent(locals.actor, params.id ?? '', query);
  return new Response(bytes, {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="${fileName}"`,
      'cache-control': 'private, no-store',
    },
  });
});
