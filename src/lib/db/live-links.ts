/** Queries on live links and their scans (a count per link and UTC day; nothing about who scanned). */
import type { Knex } from 'knex';
import type { ClientBase as PgConnection } from 'pg';
import { linkCodeNew } from '../links/link-code';
import { LINK_FILTER_NONE, linkSearchPattern, type LinkFilter } from '../links/link-filter';
import { isUuid } from './accounts';
import { db } from './knex';

export interface LiveLinkView {
  id: string;
  code: string;
  title: string;
  target: string;
  kitId: string | null;
  retired: boolean;
  scans: number;
  createdAt: string;
}

const view = (r: Record<string, unknown>): LiveLinkView => ({
  id: r.id as string,
  code: r.code as string,
  title: r.title as string,
  target: r.target_url as string,
  kitId: (r.kit_id as string | null) ?? null,
  retired: r.retired_at !== null,
  scans: Number(r.scans ?? 0),
  createdAt: (r.created_at as Date).toISOString(),
});

const withScans = (trx: Knex) =>
  trx('live_links as l').select(
    'l.*',
    trx.raw('(SELECT coalesce(sum(s.count), 0) FROM live_link_scans s WHERE s.link_id = l.id) AS scans'),
  );

/**
 * How many rows count one link's scans of a day (matches live_link_scans_shard_check). A profile of
 * `npm run bench:links` with every scan on one row found the database's time mostly spent waiting for that row's
 * lock (pg_stat_activity wait event Lock:transactionid): each scan queued behind the other nine pooled
 * connections' scans. Spread at random over 16 rows, a scan finds on average 9/16 of a scan ahead of it. The
 * shard number says nothing about who scanned: the database draws it for each scan.
 */
export const LIVE_LINK_SCAN_SHARDS = 16;

/**
 * One scan: the code's target, and 1 added to one of the day's counter rows (shard drawn by the database). The
 * statement commits asynchronously (synchronous_commit off for this transaction only: PostgreSQL 15
 * documentation, 30.4 Asynchronous Commit): the row lock is released at commit and the disk flush follows within
 * wal_writer_delay, so a scan does not hold its counter row while the WAL is flushed. A crash of the database
 * server (not of the app) can lose the scans of that last moment; it cannot corrupt or double them.
 */
const SCAN_SQL = `WITH l AS (SELECT id, target_url FROM live_links WHERE code = $1 AND retired_at IS NULL),
  s AS (
    INSERT INTO live_link_scans (link_id, day, shard, count)
    SELECT id, (now() AT TIME ZONE 'UTC')::date, floor(random() * ${LIVE_LINK_SCAN_SHARDS})::smallint, 1 FROM l
    ON CONFLICT (link_id, day, shard) DO UPDATE SET count = live_link_scans.count + 1
  ),
  a AS (SELECT set_config('synchronous_commit', 'off', true))
  SELECT target_url FROM l, a`;

/**
 * The current target of a live code, counting the scan in the same statement (one indexed lookup on the code,
 * one upsert on a counter row); null for an unknown or retired code.
 *
 * It runs as a named prepared statement on the pooled connection (node-postgres `name`), planned once per
 * connection: pgbench on this statement, 10 clients, gave about twice the statements a second prepared as
 * unprepared, planning being most of the work of so short a statement.
 */
export async function liveLinkScan(code: string, trx: Knex = db()): Promise<string | null> {
  const connection = (await trx.client.acquireConnection()) as PgConnection;
  try {
    const result = await connection.query<{ target_url: string }>({
      name: 'live-link-scan',
      text: SCAN_SQL,
      values: [code],
    });
    return result.rows[0]?.target_url ?? null;
  } finally {
    await trx.client.releaseConnection(connection);
  }
}

/**
 * Creates a link with `code` when given and free, else a fresh code (a new code on the rare collision); the
 * caller reads the code it got from the answer.
 */
export async function liveLinkInsert(
  o: { title: string; target: string; createdBy: string | null; kitId?: string | null; code?: string },
  trx: Knex = db(),
): Promise<LiveLinkView> {
  for (let attempt = 0; ; attempt++) {
    const rows = await trx('live_links')
      .insert({
        code: attempt === 0 && o.code ? o.code : linkCodeNew(),
        title: o.title,
        target_url: o.target,
        created_by: o.createdBy,
        kit_id: o.kitId ?? null,
      })
      .onConflict('code')
      .ignore()
      .returning('id');
    if (rows[0]) return (await liveLinkById(rows[0].id, trx))!;
    if (attempt > 5) throw new Error('no free live-link code after several tries');
  }
}

export async function liveLinkById(id: string, trx: Knex = db()): Promise<LiveLinkView | null> {
  if (!isUuid(id)) return null;
  const row = await withScans(trx).where('l.id', id).first();
  return row ? view(row) : null;
}

export async function liveLinkList(trx: Knex = db()): Promise<LiveLinkView[]> {
  return (await withScans(trx).orderBy('l.created_at', 'desc')).map(view);
}

/** Keeps the links `filter` asks for (src/lib/links/link-filter.ts). */
function linkFiltered(query: Knex.QueryBuilder, filter: LinkFilter): Knex.QueryBuilder {
  if (filter.search) {
    const pattern = linkSearchPattern(filter.search);
    query.where((w) =>
      w.whereILike('l.code', pattern).orWhereILike('l.title', pattern).orWhereILike('l.target_url', pattern),
    );
  }
  if (filter.owner === 'kit') query.whereNotNull('l.kit_id');
  if (filter.owner === 'other') query.whereNull('l.kit_id');
  if (filter.state === 'live') query.whereNull('l.retired_at');
  if (filter.state === 'retired') query.whereNotNull('l.retired_at');
  return query;
}

/** One page of the links `filter` keeps, newest first, with how many it keeps in all; `page` counts from 1. */
export async function liveLinkPage(
  page: number,
  pageSize: number,
  filter: LinkFilter = LINK_FILTER_NONE,
  trx: Knex = db(),
): Promise<{ links: LiveLinkView[]; total: number }> {
  const [rows, count] = await Promise.all([
    linkFiltered(withScans(trx), filter)
      .orderBy([{ column: 'l.created_at', order: 'desc' }, { column: 'l.id' }])
      .limit(pageSize)
      .offset((page - 1) * pageSize),
    linkFiltered(trx('live_links as l'), filter).count({ count: '*' }).first(),
  ]);
  return { links: rows.map(view), total: Number(count?.count ?? 0) };
}

export async function liveLinkUpdate(
  id: string,
  patch: { title?: string; target?: string; retired?: boolean },
  trx: Knex = db(),
): Promise<boolean> {
  if (!isUuid(id)) return false;
  const cols: Record<string, unknown> = { updated_at: trx.fn.now() };
  if (patch.title !== undefined) cols.title = patch.title;
  if (patch.target !== undefined) cols.target_url = patch.target;
  if (patch.retired !== undefined) cols.retired_at = patch.retired ? trx.fn.now() : null;
  return (await trx('live_links').where({ id }).update(cols)) > 0;
}

/** Scans per UTC day (the sum of the day's counter rows), oldest first; only days with scans. */
export async function liveLinkScansByDay(id: string, trx: Knex = db()): Promise<{ day: string; count: number }[]> {
  const rows = await trx('live_link_scans')
    .where({ link_id: id })
    .groupBy('day')
    .orderBy('day')
    .select(trx.raw("to_char(day, 'YYYY-MM-DD') AS day"), trx.raw('sum(count) AS count'));
  return rows.map((r) => ({ day: r.day as string, count: Number(r.count) }));
}

/** The live code of a kit's own link, or null when the kit has none or it is retired. */
export async function liveLinkCodeForKit(kitId: string, trx: Knex = db()): Promise<string | null> {
  if (!isUuid(kitId)) return null;
  const row = await trx('live_links').where({ kit_id: kitId }).whereNull('retired_at').first('code');
  return (row?.code as string | undefined) ?? null;
}
