/**
 * Server adapter: a class's kits as the class page lists them (each with its activity) and the data tools
 * of those activities, one link per tool. Kits without an activity still list; tools come only from kits.
 */
import type { Actor } from '../auth/actor';
import { TEST_KIND_LABELS, type DataTool } from '../activities/activity-facets';
import { activityDataTools, activityHrefs, dataToolHref } from '../activities/activity-links';
import { activityBySlug } from '../activities/activity-store.server';
import { kitListForActor } from '../db/kits';
import { kitView } from './saved-kit.server';
import type { KitView } from './kit-view';

export interface ClassKit {
  kit: KitView;
  /** The kit's activity, or null when it has none (or its guide left the library). */
  activity: { title: string; href: string } | null;
}

export interface ClassTool {
  tool: DataTool;
  label: string;
  href: string;
  /** Titles of the class's activities that use the tool. */
  activityTitles: string[];
}

/** The kits of one class the actor may see, newest first, and the data tools their activities use. */
export async function classKitsAndTools(
  actor: Actor,
  classId: string,
): Promise<{ kits: ClassKit[]; tools: ClassTool[] }> {
  const rows = await kitListForActor(actor, classId);
  const slugs = [...new Set(rows.map((r) => r.activity_slug).filter((s): s is string => s !== null))];
  const activities = new Map(
    (await Promise.all(slugs.map(activityBySlug))).flatMap((e) => (e ? [[e.data.slug, e.data]] : [])),
  );
  const tools = new Map<DataTool, ClassTool>();
  for (const activity of activities.values()) {
    for (const tool of activityDataTools(activity)) {
      const entry = tools.get(tool) ?? {
        tool,
        label: TEST_KIND_LABELS[tool],
        href: dataToolHref(tool),
        activityTitles: [],
      };
      entry.activityTitles.push(activity.title);
      tools.set(tool, entry);
    }
  }
  const kits = rows.map((row) => {
    const activity = row.activity_slug ? activities.get(row.activity_slug) : undefined;
    return {
      kit: kitView(row),
      activity: activity ? { title: activity.title, href: activityHrefs(activity.slug).page } : null,
    };
  });
  return { kits, tools: [...tools.values()] };
}
