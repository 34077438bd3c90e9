/**
 * Reads content/activities/*.md the way Astro's glob loader does for our purposes: YAML frontmatter between
 * the first two `---` lines, parsed by the `yaml` package (YAML 1.2), then ActivitySchema.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parse } from 'yaml';
import { ActivitySchema, type Activity } from '../../../src/lib/activities/activity-schema';

export const CONTENT_DIR = fileURLToPath(new URL('../../../content/', import.meta.url));

export interface ActivityFile {
  file: string;
  raw: unknown;
  body: string;
}

export function activityFiles(): ActivityFile[] {
  return readdirSync(`${CONTENT_DIR}activities`)
    .filter((f) => f.endsWith('.md'))
    .sort()
    .map((file) => {
      const text = readFileSync(`${CONTENT_DIR}activities/${file}`, 'utf8');
      const match = /^---\n([\s\S]*?)\n---\n([\s\S]*)$/.exec(text);
      if (!match) throw new Error(`${file}: no frontmatter`);
      return { file, raw: parse(match[1]!), body: match[2]! };
    });
}

export function activitiesParsed(): Activity[] {
  return activityFiles().map((f) => ActivitySchema.parse(f.raw));
}
