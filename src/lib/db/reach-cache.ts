/**
 * Results of queries that read only the reach source tables (the reach figures, and the review queue, whose
 * entries, classes, schools, accounts and kits are all among them) kept in memory, keyed by the query and the
 * database's reach data version (the sum of the counters in reach_data_versions, raised in the same transaction
 * as every change to one of those tables).
 * A reader reads the version first and the data after, so a cached result is never older than its version:
 * the dashboard shows the same numbers as an uncached query, and many coordinators asking for the same quarter
 * cost one query until something changes. Queries inside a transaction are never cached (their uncommitted
 * changes are nobody else's data).
 */
import type { Knex } from 'knex';

/** The most results kept; the least recently used goes first. */
export const REACH_CACHE_MAX_ENTRIES = 200;

const results = new Map<string, Promise<unknown[]>>();
let newestVersion = 0n;

/** The reach data version as committed now. */
export async function reachDataVersion(knex: Knex): Promise<bigint> {
  const { rows } = await knex.raw('SELECT COALESCE(sum(version), 0)::text AS v FROM reach_data_versions');
  return BigInt(rows[0].v as string);
}

/** The rows of a reach query, from memory when the same query ran at the current reach data version. */
export async function reachQueryRows<Row>(
  knex: Knex,
  sql: string,
  bindings: Knex.ValueDict | readonly Knex.Value[],
): Promise<Row[]> {
  const run = async () => (await knex.raw(sql, bindings as Knex.ValueDict)).rows as Row[];
  if (knex.isTransaction) return run();
  const version = await reachDataVersion(knex);
  if (version > newestVersion) {
    newestVersion = version;
    results.clear();
  }
  const key = `${version}\u0000${sql}\u0000${JSON.stringify(bindings)}`;
  const cached = results.get(key);
  const rows = cached ?? run();
  if (cached)
    results.delete(key); // set again below: a Map's order is the recency order
  else rows.catch(() => results.get(key) === rows && results.delete(key));
  results.set(key, rows);
  if (results.size > REACH_CACHE_MAX_ENTRIES) results.delete(results.keys().next().value!);
  return (await rows) as Row[];
}

/** The rows of a built query that reads reach source tables only, through the same cache. */
export function reachBuiltRows<Row>(knex: Knex, query: Knex.QueryBuilder): Promise<Row[]> {
  const { sql, bindings } = query.toSQL();
  return reachQueryRows<Row>(knex, sql, bindings);
}
