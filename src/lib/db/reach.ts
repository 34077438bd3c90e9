/**
 * Reach figures computed in PostgreSQL from the facts each figure lists (src/lib/reach/figures.ts): the facts
 * of a period are credited to schools, filtered by the school's fields, cut into buckets and groups, each unit
 * counted once per bucket and group, and summed. No fact row reaches JavaScript except in the paged drill-down.
 */
import type { Knex } from 'knex';
import { REACH_FIGURES, reachFigure, type ReachFigureId } from '../reach/figures';
import { dateParse, SCHOOL_YEAR_START_MONTH, type ReachBucket, type ReachPeriod } from '../reach/period';
import type { ReachGrouping } from '../reach/reach-query';
import { db } from './knex';
import { reachQueryRows } from './reach-cache';

export interface ReachFilters {
  region?: string | undefined;
  setting?: 'rural' | 'suburban' | 'urban' | undefined;
  highNeed?: boolean | undefined;
  schoolId?: string | undefined;
}

/** One figure's value in one bucket and group. */
export interface ReachCell {
  figure: ReachFigureId;
  /** Bucket start 'YYYY-MM-DD', or 'all'/'current'/'previous'. */
  bucket: string;
  groupKey: string;
  groupLabel: string;
  value: number;
}

const UTC_AT = "(f.at AT TIME ZONE 'UTC')";
const SCHOOL_YEAR_OFFSET = `interval '${SCHOOL_YEAR_START_MONTH - 1} months'`;

/** SQL for the start of the bucket holding a fact, as 'YYYY-MM-DD'. */
function bucketSql(bucket: ReachBucket): string {
  const start =
    bucket === 'school_year'
      ? `date_trunc('year', ${UTC_AT} - ${SCHOOL_YEAR_OFFSET}) + ${SCHOOL_YEAR_OFFSET}`
      : `date_trunc('${bucket}', ${UTC_AT})`;
  return `to_char(${start}, 'YYYY-MM-DD')`;
}

/** SQL for a group's key and its label. */
const GROUP_SQL: Record<ReachGrouping | 'none', { key: string; label: string }> = {
  none: { key: "'all'", label: "'All schools'" },
  region: { key: "COALESCE(s.region, '')", label: "COALESCE(NULLIF(s.region, ''), 'No region')" },
  setting: { key: "COALESCE(s.setting::text, '')", label: "COALESCE(s.setting::text, 'No school')" },
  high_need: {
    key: "CASE s.high_need WHEN true THEN 'true' WHEN false THEN 'false' ELSE '' END",
    label: "CASE s.high_need WHEN true THEN 'High-need' WHEN false THEN 'Not high-need' ELSE 'No school' END",
  },
  school: { key: "COALESCE(s.id::text, '')", label: "COALESCE(s.name, 'No school')" },
};

export interface Bindings {
  [key: string]: string | number | boolean | Date;
}

/** Text with LIKE's wildcards escaped, to match literally inside '%' || :q || '%'. */
export function likeEscape(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

/** WHERE conditions on a schools row `s` (region, setting, high-need, id), adding their bindings. */
export function schoolFilterSql(filters: ReachFilters, bindings: Bindings): string {
  const where: string[] = ['true'];
  if (filters.region !== undefined) {
    where.push('s.region = :region');
    bindings.region = filters.region;
  }
  if (filters.setting !== undefined) {
    where.push('s.setting = CAST(:setting AS school_setting)');
    bindings.setting = filters.setting;
  }
  if (filters.highNeed !== undefined) {
    where.push('s.high_need = :highNeed');
    bindings.highNeed = filters.highNeed;
  }
  if (filters.schoolId !== undefined) {
    where.push('s.id = CAST(:schoolId AS uuid)');
    bindings.schoolId = filters.schoolId;
  }
  return where.join(' AND ');
}

/** The facts of the given figures, tagged, credited to schools and filtered; `f.at` and `s.*` in scope. */
function factsCte(figures: readonly ReachFigureId[]): string {
  return figures
    .map((id) => `SELECT '${id}'::text AS figure, x.* FROM (${reachFigure(id).factsSql}) x`)
    .join('\nUNION ALL\n');
}

/**
 * The units of each figure, one row per (figure, bucket, group, unit) with its amount, over `period`.
 * `bucketExpr` is SQL over `f.at`.
 */
function unitsSql(bucketExpr: string, grouping: ReachGrouping | 'none', filters: ReachFilters, bindings: Bindings) {
  const group = GROUP_SQL[grouping];
  return `
    WITH facts AS (${factsCte(REACH_FIGURES.map((f) => f.id))}),
    units AS (
      SELECT f.figure, ${bucketExpr} AS bucket, ${group.key} AS group_key, ${group.label} AS group_label,
             f.unit, MAX(f.amount) AS amount
      FROM facts f LEFT JOIN schools s ON s.id = f.school_id
      WHERE ${schoolFilterSql(filters, bindings)}
      GROUP BY 1, 2, 3, 4, 5
    )`;
}

const periodBindings = (period: ReachPeriod): Bindings => ({
  from: dateParse(period.from),
  to: dateParse(period.to),
});

/** Every figure by bucket and group over the period. */
export async function reachCells(
  period: ReachPeriod,
  bucket: ReachBucket | 'all',
  grouping: ReachGrouping | 'none',
  filters: ReachFilters,
  trx: Knex = db(),
): Promise<ReachCell[]> {
  const bindings = periodBindings(period);
  const sql = `${unitsSql(bucket === 'all' ? "'all'" : bucketSql(bucket), grouping, filters, bindings)}
    SELECT figure, bucket, group_key, group_label, SUM(amount)::int AS value
    FROM units GROUP BY 1, 2, 3, 4 ORDER BY 2, 4`;
  type Row = { figure: ReachFigureId; bucket: string; group_key: string; group_label: string; value: number };
  const rows = await reachQueryRows<Row>(trx, sql, bindings);
  return rows.map((r) => ({
    figure: r.figure,
    bucket: r.bucket,
    groupKey: r.group_key,
    groupLabel: r.group_label,
    value: Number(r.value),
  }));
}

/** Every figure's total over the period and over the period before it (one query over both). */
export async function reachTotals(
  period: ReachPeriod,
  previous: ReachPeriod,
  filters: ReachFilters,
  trx: Knex = db(),
): Promise<Record<'current' | 'previous', Record<ReachFigureId, number>>> {
  const bindings = { ...periodBindings({ from: previous.from, to: period.to }), split: dateParse(period.from) };
  const sql = `${unitsSql("CASE WHEN f.at < :split THEN 'previous' ELSE 'current' END", 'none', filters, bindings)}
    SELECT figure, bucket, SUM(amount)::int AS value FROM units GROUP BY 1, 2`;
  type Row = { figure: ReachFigureId; bucket: 'current' | 'previous'; value: number };
  const rows = await reachQueryRows<Row>(trx, sql, bindings);
  const zero = () => Object.fromEntries(REACH_FIGURES.map((f) => [f.id, 0])) as Record<ReachFigureId, number>;
  const totals = { current: zero(), previous: zero() };
  for (const r of rows) {
    totals[r.bucket][r.figure] = Number(r.value);
  }
  return totals;
}

/** A breakdown row: a group and every figure for it. */
export interface ReachBreakdownRow {
  groupKey: string;
  groupLabel: string;
  values: Record<ReachFigureId, number>;
}

export interface ReachBreakdownOptions {
  grouping: ReachGrouping;
  sort: 'group' | ReachFigureId;
  dir: 'asc' | 'desc';
  q?: string | undefined;
  /** Rows to skip and to return; null returns every row (CSV export). */
  page: { offset: number; limit: number } | null;
}

/** One row per group over the period, sorted and paged in SQL, with the number of rows across all pages. */
export async function reachBreakdown(
  period: ReachPeriod,
  filters: ReachFilters,
  options: ReachBreakdownOptions,
  trx: Knex = db(),
): Promise<{ rows: ReachBreakdownRow[]; total: number }> {
  const bindings = periodBindings(period);
  const columns = REACH_FIGURES.map(
    (f) => `COALESCE(SUM(amount) FILTER (WHERE figure = '${f.id}'), 0)::int AS "${f.id}"`,
  ).join(',\n');
  const where: string[] = [];
  if (options.q) {
    where.push("group_label ILIKE '%' || :q || '%'");
    bindings.q = likeEscape(options.q);
  }
  const order = options.sort === 'group' ? 'group_label' : `"${options.sort}"`;
  const dir = options.dir === 'asc' ? 'ASC' : 'DESC';
  let limit = '';
  if (options.page) {
    limit = 'LIMIT :limit OFFSET :offset';
    bindings.limit = options.page.limit;
    bindings.offset = options.page.offset;
  }
  const sql = `${unitsSql("'all'", options.grouping, filters, bindings)},
    grouped AS (SELECT group_key, group_label, ${columns} FROM units GROUP BY group_key, group_label)
    SELECT *, count(*) OVER () AS total FROM grouped
    ${where.length ? `WHERE ${where.join(' AND ')}` : ''}
    ORDER BY ${order} ${dir}, group_label ASC, group_key ASC ${limit}`;
  const rows = await reachQueryRows<Record<string, unknown>>(trx, sql, bindings);
  return {
    total: rows.length ? Number(rows[0]!.total) : options.page && options.page.offset > 0 ? await countOnly() : 0,
    rows: rows.map((r: Record<string, unknown>) => ({
      groupKey: String(r.group_key),
      groupLabel: String(r.group_label),
      values: Object.fromEntries(REACH_FIGURES.map((f) => [f.id, Number(r[f.id])])) as Record<ReachFigureId, number>,
    })),
  };

  // A page past the end has no row to carry the total: count without paging.
  async function countOnly(): Promise<number> {
    const all = await reachBreakdown(period, filters, { ...options, page: { offset: 0, limit: 1 } }, trx);
    return all.total;
  }
}

/** A drill-down row: one unit a figure counts, first seen at `at`. */
export interface ReachFactRow {
  at: string;
  item: string;
  amount: number;
  schoolId: string | null;
  schoolName: string | null;
}

/** The units one figure counts over the period (each once, newest first), paged; null page returns all. */
export async function reachRows(
  figure: ReachFigureId,
  period: ReachPeriod,
  filters: ReachFilters,
  page: { offset: number; limit: number } | null,
  trx: Knex = db(),
): Promise<{ rows: ReachFactRow[]; total: number }> {
  const bindings = periodBindings(period);
  let limit = '';
  if (page) {
    limit = 'LIMIT :limit OFFSET :offset';
    bindings.limit = page.limit;
    bindings.offset = page.offset;
  }
  const sql = `
    WITH units AS (
      SELECT DISTINCT ON (f.unit) f.unit, f.at, f.item, f.amount, s.id AS school_id, s.name AS school_name
      FROM (${reachFigure(figure).factsSql}) f LEFT JOIN schools s ON s.id = f.school_id
      WHERE ${schoolFilterSql(filters, bindings)}
      ORDER BY f.unit, f.at
    )
    SELECT *, count(*) OVER () AS total FROM units ORDER BY at DESC, unit ${limit}`;
  const rows = await reachQueryRows<Record<string, unknown>>(trx, sql, bindings);
  return {
    total: rows.length ? Number(rows[0]!.total) : 0,
    rows: rows.map((r: Record<string, unknown>) => ({
      at: (r.at as Date).toISOString(),
      item: String(r.item ?? ''),
      amount: Number(r.amount),
      schoolId: (r.school_id as string | null) ?? null,
      schoolName: (r.school_name as string | null) ?? null,
    })),
  };
}
