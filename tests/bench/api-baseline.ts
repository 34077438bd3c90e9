/**
 * The baseline of `npm run bench:api`: a bare node:http server on the pg driver doing the same queries as the
 * app for GET /api/health (one round trip) and a teacher's kit list (lucia's two session queries, then the kit
 * list of src/lib/db/kits.ts), with nothing else: no framework, middleware, compression or validation.
 */
import { createServer } from 'node:http';
import pg from 'pg';
import { serverConfig } from '../../src/lib/server-config';

// The same pool size as the app's (src/lib/server-config.ts), so the two are compared on equal connections.
const pool = new pg.Pool({
  connectionString: serverConfig('DATABASE_URL'),
  max: serverConfig('DATABASE_POOL_MAX'),
});
const COOKIE = /(?:^|;\s*)kw_session=([^;]+)/;

const KIT_LIST = `select "kits".*, "classes"."name" as "class_name" from "kits"
  inner join "classes" on "classes"."id" = "kits"."class_id"
  where "classes"."archived_at" is null and "classes"."teacher_id" = $1
  order by "kits"."created_at" desc limit 500`;

async function kitList(cookie: string | undefined): Promise<[number, unknown]> {
  const sessionId = cookie?.match(COOKIE)?.[1];
  if (!sessionId) return [401, { error: { code: 'not_signed_in', message: 'Sign in.' } }];
  const [session, user] = await Promise.all([
    pool.query('SELECT * FROM "user_sessions" WHERE id = $1', [sessionId]),
    pool.query(
      'SELECT "users".* FROM "user_sessions" INNER JOIN "users" ON "users".id = "user_sessions".user_id WHERE "user_sessions".id = $1',
      [sessionId],
    ),
  ]);
  if (!session.rows[0] || !user.rows[0]) return [401, { error: { code: 'not_signed_in', message: 'Sign in.' } }];
  const kits = await pool.query(KIT_LIST, [user.rows[0].id]);
  return [200, { kits: kits.rows }];
}

const server = createServer((req, res) => {
  const answer: Promise<[number, unknown]> =
    req.url === '/api/health'
      ? pool
          .query("SELECT current_setting('server_version') AS version")
          .then((r) => [200, { status: 'ok', database: { ok: true, serverVersion: r.rows[0].version } }])
      : req.url === '/api/kits'
        ? kitList(req.headers.cookie)
        : Promise.resolve([404, { error: { code: 'not_found', message: 'No such route.' } }]);
  answer.then(
    ([status, body]) => {
      res.writeHead(status, { 'content-type': 'application/json; charset=utf-8', 'cache-control': 'no-store' });
      res.end(JSON.stringify(body));
    },
    () => {
      res.writeHead(500).end();
    },
  );
});
server.listen(Number(process.env.PORT), '127.0.0.1', () => console.log('baseline listening'));
process.on('SIGTERM', () => {
  server.close();
  void pool.end().then(() => process.exit(0));
});
