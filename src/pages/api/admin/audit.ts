import { auditList } from '../../../lib/db/audit';
import { endpoint } from '../../../lib/http/endpoint';

/** The latest audit events, newest first; ?limit= up to 500 (admins). */
export const GET = endpoint({ access: ['admin'] }, async ({ url }) => {
  const limit = Number(url.searchParams.get('limit') ?? 100);
  return { events: await auditList({ limit: Number.isInteger(limit) && limit > 0 ? limit : 100 }) };
});
