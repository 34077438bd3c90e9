import type { Piece } from '../../lib/geometry/types';
import type { BoomScale } from '../../lib/preview/boom-scale';
import type { AssemblyRod } from '../../lib/preview/assembly-steps';

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
  /**
   * assemblyRods(substitutes): straws, skewers or dowels that stand in for booms too thin for paper, each
   * with a step of its own after the pieces, as in the PDF's instructions; none when left out.
   */
  rods?: AssemblyRod[];
  /** Where the fold slider starts, 0 (flat) … 100 (folded); 100 when left out. */
  initialFoldPercent?: number;
}
