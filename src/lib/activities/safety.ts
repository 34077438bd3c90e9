/**
 * The fixed set of classroom hazards an activity can declare, the caution each one prints, and the material
 * keywords that imply a hazard (so a guide cannot list hot water in its materials and forget the caution).
 */
import { z } from 'zod';

/** Every hazard an activity may declare; the schema rejects anything else. */
export const HAZARDS = [
  'craft-knife',
  'scissors',
  'hot-glue',
  'hot-water',
  'lamp',
  'ice',
  'dry-ice',
  'cryogen',
  'strong-magnet',
  'power-tools',
  'ladder',
  'spring-elastic',
  'mains-power',
] as const;

export const HazardSchema = z.enum(HAZARDS, {
  errorMap: (issue, ctx) =>
    issue.code === 'invalid_enum_value'
      ? { message: `"${String(issue.received)}" is not a hazard Kitwright knows; use one of ${HAZARDS.join(', ')}` }
      : { message: ctx.defaultError },
});
export type Hazard = z.infer<typeof HazardSchema>;

/** Hazards that only trained staff may handle; the caution and the guide both say so. */
export const TRAINED_STAFF_HAZARDS: readonly Hazard[] = ['dry-ice', 'cryogen'];

/** Printed under every activity's cautions, whatever its hazards. */
export const SAFETY_GENERAL_NOTE =
  "Follow your school's safety rules and local codes. They come before anything in this guide.";

export interface HazardCaution {
  /** Short name shown as the caution's heading. */
  label: string;
  /** What to do, in plain words for the teacher. */
  caution: string;
}

/*
 * Figures: water at 60 °C burns an adult's skin in a few seconds and a child's faster (Moritz & Henriques,
 * Am. J. Pathol. 23, 1947, as tabulated in burn-prevention literature). Dry ice (solid CO₂) sublimes at
 * −78.5 °C at 1 atm and liquid nitrogen boils at −196 °C (CRC Handbook of Chemistry and Physics, physical
 * constants of inorganic compounds). From memory: pacemaker makers commonly advise keeping magnets 15 cm
 * (6 in) from the device. The rest is common practice, no source.
 */
export const HAZARD_CAUTIONS: Record<Hazard, HazardCaution> = {
  'craft-knife': {
    label: 'Craft knives',
    caution:
      'Only the teacher or an older student under watch uses a craft knife, always on a cutting mat, with a metal ruler, cutting away from the hand that holds the paper. Retract or cap the blade every time it is put down.',
  },
  scissors: {
    label: 'Scissors',
    caution:
      'Use blunt-tip scissors for younger students. Carry them closed, point down, and keep them on the table when not cutting.',
  },
  'hot-glue': {
    label: 'Hot glue',
    caution:
      'Prefer a low-temperature glue gun. Set it on its stand on a heat-proof mat, keep fingers off the nozzle and fresh glue, and keep a bowl of cool water nearby for a quick rinse if glue touches skin.',
  },
  'hot-water': {
    label: 'Hot water',
    caution:
      "Water at 60 °C burns an adult's skin within seconds, and a child's skin faster. Use warm tap water well below that for student work; only an adult pours hot water, in sturdy containers that cannot tip, away from the edge of the table.",
  },
  lamp: {
    label: 'Lamps',
    caution:
      'Lamp bulbs and shades get hot enough to burn skin and scorch paper. Clamp or weight the lamp so it cannot tip, keep paper models and cloth at the distance the guide gives, switch off when away, and let the lamp cool before touching it. Route cords where no one trips.',
  },
  ice: {
    label: 'Ice and cold packs',
    caution:
      'Ice and frozen packs can numb and hurt skin held against them for long. Handle them with a cloth or gloves, wrap packs in a towel, and wipe up melt water at once so no one slips.',
  },
  'dry-ice': {
    label: 'Dry ice (trained staff only)',
    caution:
      'Dry ice is −78.5 °C and burns skin on contact. Only trained staff handle it, with insulated gloves or tongs. It turns into carbon dioxide gas: never put it in a sealed container (it can burst), and use it only in a well-ventilated room. Students watch; they do not touch.',
  },
  cryogen: {
    label: 'Cryogens (trained staff only)',
    caution:
      'Cryogens such as dry ice (−78.5 °C) and liquid nitrogen (−196 °C) cause severe cold burns and displace air as they boil off. They are handled only by trained staff, with face shield and insulated gloves, in a well-ventilated room and in containers made for them, never sealed.',
  },
  'strong-magnet': {
    label: 'Strong magnets',
    caution:
      'Keep strong magnets at least 15 cm from anyone with a pacemaker or another implanted medical device, and away from phones, cards and computers. Two magnets can snap together and pinch skin: slide them apart, never pry. Small magnets are a serious danger if swallowed; count them out and back in.',
  },
  'power-tools': {
    label: 'Power tools',
    caution:
      'Only trained adults use power tools, with eye protection, the guard in place and the work clamped. Students stay outside the work area while a tool runs; unplug tools when not in use.',
  },
  ladder: {
    label: 'Ladders',
    caution:
      "Only adults climb ladders, one person at a time, on firm level ground with a second adult holding the foot. Follow your school's rules for working at height.",
  },
  'spring-elastic': {
    label: 'Springs and stretched elastic',
    caution:
      'A loaded spring or stretched elastic can snap or fling a part at eye level. Everyone within reach wears safety glasses while a boom is wound, loaded or released. Load and release at table height, pointing the boom away from faces, and never stretch elastic towards anyone. Replace elastic that is cracked or nicked.',
  },
  'mains-power': {
    label: 'Mains-powered devices',
    caution:
      "Only the teacher plugs in, switches and moves devices that run from a wall socket (chargers, lamps, fans, motors). Never open a device's case, and do not use one with a damaged cord or plug. Keep drinks and water away; students move the receiver, not the device.",
  },
};

/** A hazard's caution; every hazard has one (checked by the tests). */
export function hazardCaution(hazard: Hazard): HazardCaution {
  return HAZARD_CAUTIONS[hazard];
}

/**
 * Words in a materials list that imply a hazard. "dry ice" and "liquid nitrogen" are matched before the
 * plain "ice", which skips "dry ice" so that one item does not demand two different cautions.
 */
export const HAZARD_KEYWORDS: ReadonlyArray<{ hazard: Hazard; pattern: RegExp }> = [
  { hazard: 'craft-knife', pattern: /\b(craft|hobby|utility)[ -]knife|\bknives\b|\bscalpel/i },
  { hazard: 'scissors', pattern: /\bscissors\b/i },
  { hazard: 'hot-glue', pattern: /\bhot[ -]glue|\bglue gun/i },
  { hazard: 'hot-water', pattern: /\bhot water\b|\bkettle\b|\bboiling\b/i },
  { hazard: 'lamp', pattern: /\blamps?\b|\bbulbs?\b|\bheat lamp/i },
  { hazard: 'dry-ice', pattern: /\bdry ice\b/i },
  { hazard: 'cryogen', pattern: /\bliquid nitrogen\b|\bcryogen/i },
  { hazard: 'ice', pattern: /(?<!dry )\bice\b|\bice packs?\b|\bcold packs?\b/i },
  { hazard: 'strong-magnet', pattern: /\bmagnets?\b/i },
  { hazard: 'power-tools', pattern: /\bdrill\b|\bjigsaw\b|\bpower tools?\b|\bsanders?\b/i },
  { hazard: 'ladder', pattern: /\bladders?\b|\bstep[ -]?stools?\b/i },
  { hazard: 'spring-elastic', pattern: /\bsprings?\b|\belastic\b|\bbungee/i },
  {
    hazard: 'mains-power',
    pattern: /\bmains\b|\bwall socket|\bplug[- ]in\b|\bchargers?\b|\bfluorescent\b|\bextension (cord|lead)/i,
  },
];

/** Hazards implied by one line of text (a material's name), in HAZARDS order; [] for harmless text. */
export function hazardsInText(text: string): Hazard[] {
  const found = new Set(HAZARD_KEYWORDS.filter((k) => k.pattern.test(text)).map((k) => k.hazard));
  return HAZARDS.filter((h) => found.has(h));
}

/** True when a hazard is one only trained staff may handle. */
export function hazardNeedsTrainedStaff(hazard: Hazard): boolean {
  return TRAINED_STAFF_HAZARDS.includes(hazard);
}
