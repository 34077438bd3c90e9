/**
 * The shapes that flow from the model engine to layout and render: flat pieces with their folds, tabs and
 * hinge trees, and the assembled mesh. Pure data (JSON-serialisable except ModelMesh's typed arrays).
 *
 * Units: every length is millimetres at kit scale (the real model divided by the scale denominator).
 * Flat coordinates are a piece's own plane, x right and y up (mathematical orientation); outlines are
 * counter-clockwise. Model coordinates are right-handed, z up along the body axis, origin at the body's
 * base centre.
 */

declare const planeSpace: unique symbol;

/** The two planes 2D points live in: a piece's flat plane (y up) and a sheet or page (y down). */
export type PlaneSpace = 'flat' | 'sheet';

/**
 * A 2D point in millimetres in the plane `S`. The tag exists for the compiler only (at run time the point is a
 * plain [x, y] tuple, and an untagged tuple is accepted as either), so a point of one plane is refused where a
 * point of the other is expected. Layout's `placementApply` holds the rule that carries a flat point onto a sheet.
 */
export type PlanePointMm<S extends PlaneSpace> = readonly [number, number] & { readonly [planeSpace]?: S };

/** A point in a piece's flat plane, millimetres at kit scale, y up. */
export type Vec2Mm = PlanePointMm<'flat'>;

/** A point in model space, millimetres at kit scale, z up along the body axis. */
export type Vec3Mm = readonly [number, number, number];

/** The two fold kinds, named as origami does: a mountain fold rises toward the viewer of the printed side. */
export type FoldKind = 'mountain' | 'valley';

/** The three kinds of line on a sheet. */
export type LineKind = 'cut' | FoldKind;

/** One fold line across a piece, from one end to the other, in flat coordinates. */
export interface FoldLine {
  fromMm: Vec2Mm;
  toMm: Vec2Mm;
  kind: FoldKind;
  /**
   * Signed fold angle in radians: 0 leaves the paper flat; positive folds the far side toward the back of
   * the printed side (a valley seen from the printed side is negative). |angle| ≤ π.
   */
  angleRad: number;
  /** Present when this fold joins a glue tab (of that number) to its face rather than two faces. */
  tabNumber?: number;
}

/** A glue tab: a flap on one of two joined cut edges; its partner edge carries the same number. */
export interface GlueTab {
  /** The number printed on the tab and beside its partner edge, unique within a kit. */
  number: number;
  /** The tab's own polygon in flat coordinates (it is also part of the piece outline). */
  polygonMm: Vec2Mm[];
  /** Where the tab's number is printed. */
  labelAtMm: Vec2Mm;
  /**
   * Depth as cut, mm: the shallowest reach of the tab from the edge it folds on, after neighbours trimmed
   * it (a frustum's seam tab: across the seam at the narrow end; a pointed cone's wedge: at the rim).
   */
  depthMm?: number;
}

/** The number printed just inside a cut edge that a tab (on this or another piece) glues onto. */
export interface EdgeLabel {
  number: number;
  atMm: Vec2Mm;
  /** Direction of the text baseline, radians from +x, so the number reads along its edge. */
  angleRad: number;
}

/** One face of a piece: a flat polygon that stays rigid while folding. */
export interface HingeFace {
  id: number;
  polygonMm: Vec2Mm[];
}

/**
 * A fold joining a parent face to a child face. Folding rotates the child (and its subtree) about the axis
 * (from axisMm[0] to axisMm[1], flat coordinates of the unfolded piece) by angleRad, right-hand rule about
 * that direction, positive toward the back of the printed side.
 */
export interface HingeJoint {
  parent: number;
  child: number;
  axisMm: [Vec2Mm, Vec2Mm];
  angleRad: number;
}

/** A rigid placement of the flat plane in model space: flat (x, y) ↦ origin + x·xAxis + y·yAxis. */
export interface PlaneFrame {
  originMm: Vec3Mm;
  xAxis: Vec3Mm;
  yAxis: Vec3Mm;
}

/**
 * The tree of faces joined by folds. Folding every joint fully, then placing the root face by rootFrame,
 * puts every face vertex where it is on the assembled model. Curved parts (cones, tubes) have a single face
 * and a `curved` description instead of joints.
 */
export interface HingeTree {
  root: number;
  faces: HingeFace[];
  joints: HingeJoint[];
  rootFrame: PlaneFrame;
  /** For developable curved parts: how the flat sector or rectangle rolls up (used by the preview). */
  curved?: CurvedDevelopment;
}

/** How a flat sector (cone, frustum) or rectangle (tube) rolls into its 3D surface. */
export type CurvedDevelopment =
  | {
      kind: 'cone' | 'frustum';
      /** Base radius and (for a frustum) top radius of the 3D surface. */
      baseRadiusMm: number;
      topRadiusMm: number;
      heightMm: number;
      /** Flat sector: apex at flat origin, radii and angle of the developed sector. */
      outerRadiusMm: number;
      innerRadiusMm: number;
      sectorAngleRad: number;
    }
  | { kind: 'tube'; radiusMm: number; lengthMm: number };

/** The kind of model part a piece belongs to. */
export type PartKind =
  'body' | 'rigid-boom' | 'wire-boom-anchor' | 'dish' | 'nozzle' | 'solar-panel' | 'deployable-panel';

/** One connected cut-out: outline, folds, tabs, labels and the hinge tree that folds it. */
export interface Piece {
  /** Stable id within a kit, e.g. "body-wall". */
  id: string;
  partId: string;
  partKind: PartKind;
  /** Human name printed on the piece, e.g. "Body wall". */
  label: string;
  /** The cut line: a closed counter-clockwise polygon including the tabs (first point not repeated). */
  outlineMm: Vec2Mm[];
  folds: FoldLine[];
  tabs: GlueTab[];
  edgeLabels: EdgeLabel[];
  hinge: HingeTree;
  /** Area of the faces alone (tabs and overlap strips excluded), mm². */
  faceAreaMm2: number;
  /** 1-based order in which the piece is assembled; pieces of one step share a number. */
  assemblyStep: number;
}

/** A wire boom at kit scale: no pattern, a length of thread. */
export interface WireBoomThread {
  partId: string;
  label: string;
  /** Thread length at kit scale, mm (boom length plus the tie-off allowance stated in the kit). */
  threadLengthMm: number;
  /** Deployed length at kit scale, mm. */
  deployedLengthMm: number;
}

/** The assembled model as triangles for STL and the 3D preview: positions in mm at kit scale. */
export interface ModelMesh {
  /** x, y, z per vertex. */
  positions: Float32Array;
  /** Three vertex indices per triangle, counter-clockwise seen from outside. */
  indices: Uint32Array;
}
