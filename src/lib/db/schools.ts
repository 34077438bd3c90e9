/** Queries on schools: the list teachers pick from at sign-up, and proposals of new schools. */
import type { Knex } from 'knex';
import { db } from './knex';

export interface SchoolOption {
  id: string;
  name: string;
  city: string;
}

export interface SchoolSummary extends SchoolOption {
  region: string;
  country: string;
  setting: 'rural' | 'suburban' | 'urban';
  highNeed: boolean;
  status: 'approved' | 'proposed';
}

/** Approved schools by name, for the sign-up list. */
export async function schoolOptions(trx: Knex = db()): Promise<SchoolOption[]> {
  return trx('schools').where({ status: 'approved' }).select('id', 'name', 'city').orderBy('name');
}

/** Every school with its status and reach fields (coordinators and admins). */
export async function schoolListAll(trx: Knex = db()): Promise<SchoolSummary[]> {
  const rows = await trx('schools').select('*').orderBy('name');
  return rows.map((r) => ({
    id: r.id,
    name: r.name,
    city: r.city,
    region: r.region,
    country: r.country,
    setting: r.setting,
    highNeed: r.high_need,
    status: r.status,
  }));
}

/** The approved school with this id, or null. */
export async function schoolApprovedById(id: string, trx: Knex = db()): Promise<SchoolOption | null> {
  return (await trx('schools').where({ id, status: 'approved' }).first('id', 'name', 'city')) ?? null;
}

/**
 * A proposed school by name and city: the existing row when one with the same name and city (ignoring case)
 * exists, otherwise a new row with status "proposed". Returns its id and whether it was created.
 */
export async function schoolPropose(
  name: string,
  city: string,
  trx: Knex = db(),
): Promise<{ id: string; created: boolean }> {
  const existing = await trx('schools')
    .whereRaw('lower(name) = lower(?) AND lower(city) = lower(?)', [name, city])
    .first('id');
  if (existing) return { id: existing.id, created: false };
  const rows = await trx('schools')
    .insert({ name, city, status: 'proposed' })
    .onConflict(['name', 'city'])
    .ignore()
    .returning('id');
  if (rows[0]) return { id: (rows[0] as { id: string }).id, created: true };
  const again = await trx('schools').where({ name, city }).first('id');
  return { id: again.id, created: false };
}
