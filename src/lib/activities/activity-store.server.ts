/**
 * Server adapter: the activity guides from Astro's content collection, in library order. Pages and endpoints
 * use it; islands get the activity as props.
 */
import { getCollection, getEntry, type CollectionEntry } from 'astro:content';

export type ActivityEntry = CollectionEntry<'activities'>;

/** Every activity, by `order` then title. */
export async function activitiesAll(): Promise<ActivityEntry[]> {
  const entries = await getCollection('activities');
  return entries.sort((a, b) => a.data.order - b.data.order || a.data.title.localeCompare(b.data.title));
}

/** One activity by slug, or null when there is none (the page answers 404). */
export async function activityBySlug(slug: string | undefined): Promise<ActivityEntry | null> {
  if (!slug || !/^[a-z0-9-]{1,80}$/.test(slug)) return null;
  return (await getEntry('activities', slug)) ?? null;
}

/** Titles of demo models by id, for naming the kits an activity uses. */
export async function modelTitles(): Promise<Map<string, string>> {
  const models = await getCollection('models');
  return new Map(models.map((m) => [m.data.id, m.data.title]));
}
