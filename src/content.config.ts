/**
 * Content collections (Astro 5 content layer): the activity guides and the demo models. Both schemas live in
 * src/lib/activities so the tests check the very rules Astro applies when it loads the files.
 */
import { defineCollection } from 'astro:content';
import { glob } from 'astro/loaders';
import { ActivitySchema } from './lib/activities/activity-schema';
import { ModelEntrySchema } from './lib/activities/model-entry-schema';

const activities = defineCollection({
  // The glob loader takes the entry id from the frontmatter's `slug`, so URLs follow the slug field.
  loader: glob({ pattern: '*.md', base: './content/activities' }),
  schema: ActivitySchema,
});

const models = defineCollection({
  loader: glob({ pattern: '*.json', base: './content/models' }),
  schema: ModelEntrySchema,
});

export const collections = { activities, models };
