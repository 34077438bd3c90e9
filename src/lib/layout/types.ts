/**
 * Laid-out sheets: the one input of the renderers (SVG, PDF) besides the pieces themselves.
 *
 * Sheet coordinates are millimetres from the sheet's top-left corner, x right and y down (as on the
 * printed page, in SVG and in jspdf). A placement maps a piece's flat point p = (px, py) (y up) to the sheet
 * by: q = (mirrored ? −px : px, −py); s = R(rotationRad)·q + (xMm, yMm), where R rotates clockwise on the
 * page for positive angles (the y-down convention of SVG's rotate()). See `placementApply` in
 * src/lib/layout/placement.ts, the single implementation of this rule.
 */
import type { Piece, PlanePointMm, WireBoomThread } from '../geometry/types';
import type { BuildGradeBand } from '../geometry/buildability';
import type { PartSubstitute } from '../geometry/part-substitutes';
import type { PlacedCutGauge } from './cut-gauge';

/** A point on a sheet or page: millimetres from its top-left corner, y down. */
export type SheetVec2Mm = PlanePointMm<'sheet'>;

/** Paper sizes and sheet stock by name, with their size in mm (portrait: width ≤ height). */
export interface SheetSize {
  id: string;
  label: string;
  widthMm: number;
  heightMm: number;
  /** Paper prints from a printer; stock is cut by hand or machine (plywood, foam board). */
  kind: 'paper' | 'stock';
}

/** A rectangle on a sheet or in a piece's frame, mm. */
export interface RectMm {
  xMm: number;
  yMm: number;
  widthMm: number;
  heightMm: number;
}

/** Where one piece (or one tile of a large piece) sits on a sheet. */
export interface Placement {
  pieceId: string;
  xMm: number;
  yMm: number;
  rotationRad: number;
  mirrored: boolean;
  /**
   * Present when the piece is split across sheets: this sheet shows only `windowMm` (sheet coordinates)
   * of the placed piece; neighbours overlap by `overlapMm` and carry matching alignment marks.
   */
  tile?: { row: number; col: number; rows: number; cols: number; windowMm: RectMm; overlapMm: number };
}

/** A short cross printed where two tiles of one piece must line up, with the letter both tiles show. */
export interface AlignmentMark {
  atMm: SheetVec2Mm;
  letter: string;
}

/** One printed page or one panel of stock. */
export interface LaidOutSheet {
  /** 1-based. */
  number: number;
  widthMm: number;
  heightMm: number;
  /** Printable area: nothing is placed outside it. */
  printableMm: RectMm;
  placements: Placement[];
  alignmentMarks: AlignmentMark[];
  /** Cut-to-length gauges for rods that replace thin booms (cut-gauge.ts); absent when there are none. */
  gauges?: PlacedCutGauge[];
}

/** A row of the cut list printed for sheet stock. */
export interface CutListRow {
  part: string;
  widthMm: number;
  heightMm: number;
  quantity: number;
  sheets: number[];
}

/** Everything the renderers need for one kit. */
export interface KitLayout {
  title: string;
  /** The kit is 1:scaleDenominator of the real spacecraft. */
  scaleDenominator: number;
  sheetSize: SheetSize;
  /** Units for printed sizes and the check square (50 mm or 2 in). */
  units: 'metric' | 'us';
  pieces: Piece[];
  sheets: LaidOutSheet[];
  threads: WireBoomThread[];
  /** Parts too fine for paper and what replaces them (materials list; rods get a cut-to-length gauge). */
  substitutes: PartSubstitute[];
  /** The class the kit is for: marks and labels are sized for it. */
  gradeBand: BuildGradeBand;
  cutList: CutListRow[];
  /** The kit page the first sheet's QR code points at; null for an unsaved kit (a note prints instead). */
  qrUrl: string | null;
  /** Engine version that produced the layout, printed small on each sheet. */
  engineVersion: string;
  /**
   * Smallest printed mark the kit's readers can read, mm (the grade band's smallest label); the glue marks'
   * default (GLUE_MARK_MIN_MM_DEFAULT, grades 6–8) when absent.
   */
  smallestLabelMm?: number;
  /** What to have ready besides paper and glue (thread, rods, …), one line each; printed on the instructions. */
  materials?: string[];
  /** Cautions for building the kit, one line each, ending with the school-rules note; printed likewise. */
  cautions?: string[];
  /** Where the instructions pages go in the PDF: before the sheets or after them (the default). */
  instructionsAt?: 'first' | 'last';
}
