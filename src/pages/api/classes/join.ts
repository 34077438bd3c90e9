import { clientIp } from '../../../lib/auth/client-ip.server';
import { housekeepingMaybe } from '../../../lib/auth/housekeeping.server';
import { classForActor } from '../../../lib/auth/class-access.server';
import { classIdForCode } from '../../../lib/auth/class-flows.server';
import { ClassJoinSchema } from '../../../lib/auth/class-schemas';
import { RATE_LIMITS } from '../../../lib/auth/rate-limit-rules';
import { rateLimitEnforce } from '../../../lib/auth/rate-limit.server';
import { classSessionEnd, classSessionStart } from '../../../lib/auth/session.server';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_ID } from '../../../lib/http/body-limits';

/**
 * Opens an 8-hour class session from a class code: no account, no personal data. Rate limited per address
 * and per code. (A signed-in account keeps acting as itself; the class cookie matters once it signs out.)
 */
export const POST = endpoint({ access: ['anyone'] }, async (context) => {
  const input = parseInput(ClassJoinSchema, await readJson(context.request, BODY_BYTES_ID), 'class code');
  await rateLimitEnforce(RATE_LIMITS.classCodeIp, clientIp(context));
  await rateLimitEnforce(RATE_LIMITS.classCodeCode, input.code);
  const classId = await classIdForCode(input.code);
  await classSessionEnd(context);
  await classSessionStart(context, classId);
  housekeepingMaybe(context.locals.requestId);
  const view = await classForActor({ kind: 'class', classId, classSessionId: '' }, classId);
  return { ok: true, class: view };
});
