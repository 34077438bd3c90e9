import { APP_VERSION } from '../../lib/app-version';
import { databaseHealth } from '../../lib/db/health';
import { endpoint } from '../../lib/http/endpoint';
import { json } from '../../lib/http/respond';

export const GET = endpoint({ access: ['anyone'] }, async () => {
  const database = await databaseHealth();
  return json({ status: database.ok ? 'ok' : 'degraded', version: APP_VERSION, database }, database.ok ? 200 : 503);
});
