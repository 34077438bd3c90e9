/**
 * The numbers the scale tool shows a class beside the solver's own explanations: the scale chosen, the
 * body's size on paper, each wire boom's thread, and the span laid out in the venue.
 */
import { bodyBaseM } from '../geometry/body-shape';
import type { Model } from '../geometry/model-schema';
import { modelSpan } from '../geometry/model-span';
import type { WireBoomThread } from '../geometry/types';
import { wireBoomThread } from '../geometry/wire-boom';
import { pointsBounds } from '../geometry/vec';
import { solveKitScale, type KitScale } from '../layout/scale-solver';
import type { SheetSizeId } from '../layout/sheet-sizes';
import type { UnitSystem } from '../layout/units';
import type { Venue } from '../layout/venues';

export interface ScaleExplanation {
  kit: KitScale;
  /** The paper model's scale: the one scale when there is one, else the paper-only choice. */
  paperDenominator: number;
  /** Body across (the larger base extent) and height at paperDenominator, mm. */
  bodyOnPaperMm: { acrossMm: number; heightMm: number };
  /** Span with everything deployed, full size, mm (longer first). */
  spanFullMm: [number, number];
  /** Threads at the scale the booms are laid out at (the kit's, or the venue's when no one scale works). */
  threads: WireBoomThread[];
  threadsDenominator: number;
  /** Footprint in the venue at threadsDenominator, mm. */
  spanInVenueMm: [number, number];
}

/** Solves and measures a parsed model on a sheet and in a venue; throws InputError as solveKitScale does. */
export function scaleExplain(
  model: Model,
  req: { sheetId: SheetSizeId; paperGsm: number },
  venue: Venue,
  units: UnitSystem,
): ScaleExplanation {
  const kit = solveKitScale(model, req, venue, units);
  const paperDenominator = kit.scaleDenominator ?? kit.paper.scaleDenominator;
  const { base, heightM } = bodyBaseM(model.body);
  const b = pointsBounds(base);
  const acrossM = Math.max(b.maxX - b.minX, b.maxY - b.minY);
  const spanFullMm = modelSpan(model).footprintMm;
  const threadsDenominator = kit.scaleDenominator ?? kit.venue.scaleDenominator;
  const threads = model.appendages.flatMap((a) =>
    a.kind === 'wire-boom' ? [wireBoomThread(a.id, a.label, a.lengthM, threadsDenominator)] : [],
  );
  return {
    kit,
    paperDenominator,
    bodyOnPaperMm: { acrossMm: (acrossM * 1000) / paperDenominator, heightMm: (heightM * 1000) / paperDenominator },
    spanFullMm,
    threads,
    threadsDenominator,
    spanInVenueMm: [spanFullMm[0] / threadsDenominator, spanFullMm[1] / threadsDenominator],
  };
}
