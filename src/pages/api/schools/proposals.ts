import { STAFF } from '../../../lib/auth/actor';
import { schoolProposals } from '../../../lib/db/school-directory';
import { endpoint } from '../../../lib/http/endpoint';

/** Schools teachers proposed, waiting for a coordinator, each with existing schools of a similar name. */
export const GET = endpoint({ access: STAFF }, async () => ({ proposals: await schoolProposals() }));
