/**
 * Server adapter: the big-build plan of an event for a coordinator, or for a teacher with a confirmed place on
 * it: the event's kit model, laid out on the event's venue or another one, with the kit engine's cut list on
 * stock panels at that scale.
 */
import type { Actor } from '../auth/actor';
import { eventById, registrationConfirmed, type EventView } from '../db/events';
import { kitById } from '../db/kits';
import { ConflictError, InputError, NotFoundError } from '../errors';
import { kitFonts } from '../kit/fonts.server';
import { kitMaterials } from '../kit/kit-materials';
import { kitRequestForRow } from '../kit/saved-kit.server';
import { modelPatterns } from '../geometry/model-patterns';
import { cutListRows } from '../layout/cut-list';
import { sheetPack } from '../layout/sheet-packer';
import { sheetSize } from '../layout/sheet-sizes';
import { VENUES, venueCustom, type Venue, type VenueId } from '../layout/venues';
import { actorIsStaff } from './event-access.server';
import { buildPlanPdf, type BuildPlanInput } from './build-plan-pdf';
import type { BuildPlanQuery } from './build-plan-query';
import { stakeOutPlan } from './stake-out';

const NOT_FOUND = 'No event has this address among the events whose plan you may open.';

/** The event if the actor is staff or holds a confirmed place on it (a published event), else 404. */
async function planEvent(actor: Actor, id: string): Promise<EventView> {
  const event = await eventById(id);
  if (!event || actor.kind !== 'user') throw new NotFoundError(NOT_FOUND);
  if (actorIsStaff(actor)) return event;
  if (event.publishedAt !== null && (await registrationConfirmed(event.id, actor.userId))) return event;
  throw new NotFoundError(NOT_FOUND);
}

/** The venue the query names, else the event's. */
function planVenue(event: EventView, query: BuildPlanQuery): Venue {
  if (query.venue) return VENUES[query.venue];
  if (query.lengthM !== undefined && query.widthM !== undefined)
    return venueCustom({ lengthM: query.lengthM, widthM: query.widthM });
  if (event.venuePreset && event.venuePreset in VENUES) return VENUES[event.venuePreset as VenueId];
  if (event.venueLengthM && event.venueWidthM)
    return venueCustom({ lengthM: event.venueLengthM, widthM: event.venueWidthM });
  throw new InputError(
    'This event has no venue size: add ?venue=football-field (or another preset) or ?lengthM=…&widthM=… in metres.',
    { venue: ['a preset or a typed size'] },
  );
}

/** The plan PDF's bytes and a file name. */
export async function buildPlanForEvent(
  actor: Actor,
  id: string,
  query: BuildPlanQuery,
): Promise<{ bytes: Uint8Array<ArrayBuffer>; fileName: string }> {
  const event = await planEvent(actor, id);
  const kit = event.kitId ? await kitById(event.kitId) : null;
  if (!kit) throw new ConflictError('This event has no kit yet: pick the kit to build in the event first.');
  const request = await kitRequestForRow(kit);
  const venue = planVenue(event, query);
  const model = request.model;
  const fitted = stakeOutPlan(model, venue, 1).venueScale.scaleDenominator;
  const n = query.scale ?? event.buildScaleDenominator ?? fitted;
  const plan = stakeOutPlan(model, venue, n);
  const panel = sheetSize('panel-1220x2440');
  const { pieces, substitutes } = modelPatterns(model, {
    scaleDenominator: n,
    paperGsm: request.paperGsm,
    gradeBand: request.gradeBand,
  });
  let cutList: BuildPlanInput['cutList'];
  try {
    const sheets = sheetPack(pieces, { sheetSize: panel, units: request.units, copies: 1, substitutes });
    cutList = { rows: cutListRows(pieces, sheets), panels: sheets.length, panelLabel: panel.label };
  } catch (err) {
    if (!(err instanceof InputError)) throw err;
    cutList = { reason: `No cut list at 1:${n}: ${err.message}` };
  }
  // Rope lengths come from the stake-out; the kit's list adds what replaces parts too fine to cut.
  const materials = kitMaterials({ threads: [], substitutes, gradeBand: request.gradeBand, units: 'metric' }).map(
    (m) => (m.caution ? `${m.text} ${m.caution}` : m.text),
  );
  const bytes = buildPlanPdf(
    {
      eventTitle: event.title,
      modelName: model.name,
      venueLabel: venue.label,
      whenText: `${event.startsLocal.replace('T', ' ')} (${event.timeZone})${event.venue ? `, ${event.venue}` : ''}.`,
      plan,
      cutList,
      materials,
      paper: query.paper,
    },
    await kitFonts(),
  );
  return { bytes, fileName: `big-build-plan-1-${n}.pdf` };
}
