/**
 * The assembly steps of a kit in order, the one source of the build order for the PDF's instructions page,
 * the step badges printed on the pieces and the 3D preview: each step adds one piece and glues at most
 * ASSEMBLY_STEP_JOINTS_MAX of its joints (the numbered tabs), with a plain-text description.
 *
 * A glue joint is a tab number: the tab on one piece and the edge with the same number on another (or the
 * same) piece. It is glued in the step that adds the later of its two pieces, so split pieces and new joints
 * are covered without knowing how they were made.
 */
import { buildabilityMm } from '../geometry/buildability';
import { BOOM_STOCK, type PartSubstitute } from '../geometry/part-substitutes';
import type { Piece } from '../geometry/types';
import { FOLD_WORDS } from '../render/fold-words';

/** A rod (straw, skewer, dowel) standing in for a boom too thin for paper: one step of its own. */
export type AssemblyRod = Extract<PartSubstitute, { kind: 'boom-stock' }>;

/** Most glue joints in one step: a class glues four tabs before it needs to check the next ones. */
export const ASSEMBLY_STEP_JOINTS_MAX = 4; // issue 10: "steps of at most four joints each"

export interface AssemblyStep {
  /** 1-based position in the build. */
  number: number;
  /** The piece added (or still being glued) in this step. */
  pieceIds: string[];
  pieceLabels: string[];
  /** Pieces fully or partly assembled before this step, in build order, then the rods already glued on. */
  builtPieceIds: string[];
  /** The rod glued on in this step (its boom's partId); only on a rod's step. */
  rodPartId?: string;
  /** Tab numbers to glue in this step, ascending, at most ASSEMBLY_STEP_JOINTS_MAX; each joint in one step. */
  tabNumbers: number[];
  /** What to do, in one or two plain sentences with the tab numbers (the description without its prefix). */
  action: string;
  /** "Step n of m: piece label. action", for screen readers. */
  description: string;
}

/** Whether a piece is already built, being added, or still to come at a step. */
export type AssemblyPieceState = 'built' | 'current' | 'later';

/** The rods among a kit's substitutes, in order: the ones that get a step of their own. */
export function assemblyRods(substitutes: readonly PartSubstitute[]): AssemblyRod[] {
  return substitutes.filter((s): s is AssemblyRod => s.kind === 'boom-stock');
}

/** The state of a piece, or of a rod by its partId, at a step (no step: everything is built). */
export function assemblyStepPieceState(step: AssemblyStep | undefined, pieceId: string): AssemblyPieceState {
  if (!step) return 'built';
  if (step.pieceIds.includes(pieceId) || step.rodPartId === pieceId) return 'current';
  return step.builtPieceIds.includes(pieceId) ? 'built' : 'later';
}

/**
 * The steps of `pieces`: pieces by assemblyStep, then in the given order, then one step per rod that replaces
 * a boom (no pieces, no tabs: cut it to length and glue it on); nothing gives [].
 */
export function assemblySteps(pieces: readonly Piece[], rods: readonly AssemblyRod[] = []): AssemblyStep[] {
  const order = pieces
    .map((p, i) => ({ p, i }))
    .sort((a, b) => a.p.assemblyStep - b.p.assemblyStep || a.i - b.i)
    .map(({ p }) => p);
  const rank = new Map(order.map((p, i) => [p.id, i]));
  // Each joint's two pieces: the one with the tab and the one with the edge label (the same piece for a seam).
  const where = new Map<number, number[]>();
  for (const p of order) {
    for (const t of p.tabs) where.set(t.number, [...(where.get(t.number) ?? []), rank.get(p.id)!]);
    for (const e of p.edgeLabels) where.set(e.number, [...(where.get(e.number) ?? []), rank.get(p.id)!]);
  }
  const joints = order.map(() => [] as number[]);
  for (const [number, ranks] of where) joints[Math.max(...ranks)]!.push(number);
  const raw: Omit<AssemblyStep, 'description' | 'action' | 'number'>[] = [];
  const built: string[] = [];
  order.forEach((piece, i) => {
    const numbers = joints[i]!.sort((a, b) => a - b);
    const chunks: number[][] = [];
    for (let k = 0; k < numbers.length; k += ASSEMBLY_STEP_JOINTS_MAX)
      chunks.push(numbers.slice(k, k + ASSEMBLY_STEP_JOINTS_MAX));
    if (chunks.length === 0) chunks.push([]);
    for (const tabNumbers of chunks)
      raw.push({ pieceIds: [piece.id], pieceLabels: [piece.label], builtPieceIds: [...built], tabNumbers });
    built.push(piece.id);
  });
  const byId = new Map(order.map((p) => [p.id, p]));
  const total = raw.length + rods.length;
  const pieceSteps = raw.map((step, i) => {
    const piece = byId.get(step.pieceIds[0]!)!;
    const first = i === 0 || raw[i - 1]!.pieceIds[0] !== piece.id;
    const action = first ? assemblyAction(piece, step.tabNumbers) : assemblyMore(step.tabNumbers);
    const description = `Step ${i + 1} of ${total}: ${piece.label}. ${action}`;
    return { number: i + 1, ...step, action, description };
  });
  const rodSteps = rods.map((rod, k) => {
    const number = raw.length + k + 1;
    const action = `Cut ${BOOM_STOCK[rod.stock].words} to ${buildabilityMm(rod.lengthMm)} against its gauge on the sheet, then glue one end to the body where the boom stands.`;
    return {
      number,
      pieceIds: [],
      pieceLabels: [rod.label],
      builtPieceIds: [...order.map((p) => p.id), ...rods.slice(0, k).map((r) => r.partId)],
      rodPartId: rod.partId,
      tabNumbers: [],
      action,
      description: `Step ${number} of ${total}: ${rod.label}. ${action}`,
    };
  });
  return [...pieceSteps, ...rodSteps];
}

/** Tab numbers in words with runs collapsed: [1, 2, 3, 5] → "tabs 1–3 and 5"; [] → "no tabs". */
export function tabNumbersLabel(numbers: readonly number[]): string {
  if (numbers.length === 0) return 'no tabs';
  const sorted = [...numbers].sort((a, b) => a - b);
  const runs: string[] = [];
  let start = sorted[0]!;
  for (let i = 1; i <= sorted.length; i++) {
    if (i < sorted.length && sorted[i] === sorted[i - 1]! + 1) continue;
    const end = sorted[i - 1]!;
    runs.push(end === start ? `${start}` : end === start + 1 ? `${start} and ${end}` : `${start}–${end}`);
    if (i < sorted.length) start = sorted[i]!;
  }
  const list = runs.length > 1 ? `${runs.slice(0, -1).join(', ')} and ${runs.at(-1)}` : runs[0]!;
  return `${sorted.length === 1 ? 'tab' : 'tabs'} ${list}`;
}

/** The words for a piece's later steps: only more joints to glue. */
function assemblyMore(numbers: readonly number[]): string {
  return `Go on: glue ${tabNumbersLabel(numbers)}, each onto the edge with the same number.`;
}

/** The words for the step that adds a piece, by the kind of part it is. */
function assemblyAction(piece: Piece, numbers: readonly number[]): string {
  const t = tabNumbersLabel(numbers);
  const glue = numbers.length ? ` Glue ${t}, each onto the edge with the same number.` : '';
  switch (piece.partKind) {
    case 'body': {
      const folds = piece.folds.some((f) => f.tabNumber === undefined);
      if (folds) return `Fold along every fold line (${FOLD_WORDS.short}).${glue}`;
      return numbers.length
        ? `Set it in place and glue ${t}, matching the numbers printed along its edges.`
        : 'Set it in place.';
    }
    case 'rigid-boom':
      return `Roll it into a tube and glue its overlap strip (${t}) under the edge with the same number, then stand it on the body.`;
    case 'dish':
    case 'nozzle':
      // Too small to roll for the class: printed as a flat disc (part-substitutes.ts).
      if (!piece.hinge.curved) return 'Glue the flat disc onto the body at its place, printed side out.';
      return `Curl it into a cone and glue ${t} under the edge with the same number, then glue it onto the body.`;
    case 'wire-boom-anchor':
      return `Lay the thread where the body is printed with ${numbers.join(', ')}, fold the anchor over it and glue ${t} there.`;
    case 'deployable-panel':
      return `Fold the hinge strip and glue ${t} onto the body where the same number is printed.`;
    case 'solar-panel':
      return `Glue it flat onto its face of the body.${glue}`;
  }
}
