import type { Piece } from '../../lib/geometry/types';
import type { BoomScale } from '../../lib/preview/boom-scale';
import type { PartSubstitute } from '../../lib/geometry/part-substitutes';

/** A rod standing in for a boom too thin for paper, as the preview draws it. */
export type PreviewRod = Pick<
  Extract<PartSubstitute, { kind: 'boom-stock' }>,
  'partId' | 'fromMm' | 'toMm' | 'diameterMm'
>;

/**
 * What a page passes to the FoldPreview island: plain JSON computed on the server from src/lib (Astro
 * serialises it into the page), so the island needs no API call to draw its first frame.
 */
export interface FoldPreviewProps {
  /** The model's name, shown in the heading and the 3D view's accessible name. */
  title: string;
  /** The kit is 1:scaleDenominator of the real spacecraft. */
  scaleDenominator: number;
  /** modelPatterns(model, options).pieces: flat pieces with hinge trees, mm at kit scale. */
  pieces: Piece[];
  /** boomScale(model, scaleDenominator): the span beside a person and a classroom. */
  boomScale: BoomScale;
  /** Straws, skewers or dowels that stand in for booms too thin for paper; none when left out. */
  rods?: PreviewRod[];
  /** Where the fold slider starts, 0 (flat) … 100 (folded); 100 when left out. */
  initialFoldPercent?: number;
}
