/** The choices of the coordinator's event form, read on the server and handed to the island as props. */
import { activitiesAll } from '../activities/activity-store.server';
import type { Actor } from '../auth/actor';
import { kitListForActor } from '../db/kits';
import { schoolOptions } from '../db/schools';

export interface EventFormOptions {
  schools: { value: string; label: string }[];
  kits: { value: string; label: string }[];
  activities: { value: string; label: string }[];
  /** IANA zone names the server knows (Intl.supportedValuesOf), which the schema accepts. */
  timeZones: string[];
}

export async function eventFormOptions(actor: Actor): Promise<EventFormOptions> {
  const [schools, kits, activities] = await Promise.all([schoolOptions(), kitListForActor(actor), activitiesAll()]);
  return {
    schools: schools.map((s) => ({ value: s.id, label: s.city ? `${s.name} (${s.city})` : s.name })),
    kits: kits.map((k) => ({ value: k.id, label: `${k.title} (${k.class_name})` })),
    activities: activities.map((a) => ({ value: a.id, label: a.data.title })),
    timeZones: [...Intl.supportedValuesOf('timeZone'), 'UTC'].filter((z, i, all) => all.indexOf(z) === i),
  };
}
