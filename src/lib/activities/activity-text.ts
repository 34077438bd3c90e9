/** Short texts built from an activity's fields, shared by the page and the PDFs so both say the same. */
import type { Activity } from './activity-schema';

type Material = Activity['materials'][number];

/** The quantity as printed: "2", "1 roll", "3 sheets" ("sheets" with 1 reads "1 sheet"). */
export function activityMaterialAmount(m: Material): string {
  if (!m.unit) return String(m.quantity);
  const unit = m.quantity === 1 && /[^s]s$/.test(m.unit) ? m.unit.slice(0, -1) : m.unit;
  return `${m.quantity} ${unit}`;
}

/** "Scissors: 2 per team" style label for lists. */
export function activityMaterialLabel(m: Material): string {
  return `${m.item}: ${activityMaterialAmount(m)} per ${m.per}`;
}

/** "Teams of 3–4" or "Teams of 2" when min equals max. */
export function activityTeamLabel(team: Activity['teamSize']): string {
  return team.min === team.max ? `Teams of ${team.min}` : `Teams of ${team.min}–${team.max}`;
}
