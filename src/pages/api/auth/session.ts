import { actorPublic } from '../../../lib/auth/actor-require';
import { endpoint } from '../../../lib/http/endpoint';

/** Who this browser is signed in as (or its class session, or nobody). */
export const GET = endpoint({ access: ['anyone'] }, (context) => ({ actor: actorPublic(context.locals.actor) }));
