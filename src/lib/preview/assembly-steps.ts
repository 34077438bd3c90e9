/**
 * The assembly steps of a kit in order: the pieces of each step, the numbered tabs to glue (the numbers
 * printed on the sheets) and a plain-text description for screen readers.
 */
import type { Piece } from '../geometry/types';

export interface AssemblyStep {
  /** 1-based position in the build, contiguous even if the pieces' step numbers have gaps. */
  number: number;
  pieceIds: string[];
  pieceLabels: string[];
  /** Tab numbers to glue in this step, ascending; each number of the kit appears in exactly one step. */
  tabNumbers: number[];
  /** One or two plain sentences naming the pieces, what to do and the tab numbers. */
  description: string;
}

/** The steps of `pieces`, ordered by assemblyStep then by the pieces' order; no pieces gives []. */
export function assemblySteps(pieces: readonly Piece[]): AssemblyStep[] {
  const byStep = new Map<number, Piece[]>();
  for (const p of pieces) byStep.set(p.assemblyStep, [...(byStep.get(p.assemblyStep) ?? []), p]);
  const ordered = [...byStep.keys()].sort((a, b) => a - b);
  return ordered.map((key, i) => {
    const group = byStep.get(key)!;
    const tabNumbers = [...new Set(group.flatMap((p) => p.tabs.map((t) => t.number)))].sort((a, b) => a - b);
    const actions = group.map((p) => assemblyAction(p));
    // One piece: "Label. Action."; several: each action after its own piece's label.
    const said =
      group.length === 1
        ? `${group[0]!.label}. ${actions[0]}`
        : group.map((p, k) => `${p.label}: ${actions[k]}`).join(' ');
    return {
      number: i + 1,
      pieceIds: group.map((p) => p.id),
      pieceLabels: group.map((p) => p.label),
      tabNumbers,
      description: `Step ${i + 1} of ${ordered.length}: ${said}`,
    };
  });
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

function assemblyAction(piece: Piece): string {
  const tabs = piece.tabs.map((x) => x.number).sort((a, b) => a - b);
  const t = tabNumbersLabel(tabs);
  switch (piece.partKind) {
    case 'body': {
      // A body piece with no tabs of its own (a cap) is where other pieces' tabs land.
      if (tabs.length === 0) {
        const edges = [...new Set(piece.edgeLabels.map((e) => e.number))];
        return edges.length > 0
          ? `Glue it onto ${tabNumbersLabel(edges)}, matching the numbers printed along its edges.`
          : 'Fold it along its fold lines.';
      }
      const fold = piece.folds.some((f) => f.tabNumber === undefined)
        ? 'Fold along every fold line, then glue'
        : 'Glue';
      return `${fold} ${t}, each onto the edge printed with the same number.`;
    }
    case 'rigid-boom':
      return `Roll it into a tube and glue its overlap strip (${t}) under the edge with the same number, then stand it on the body.`;
    case 'dish':
    case 'nozzle':
      // Too small to roll for the class: printed as a flat disc (part-substitutes.ts).
      if (!piece.hinge.curved) return 'Glue the flat disc onto the body at its place, printed side out.';
      return `Curl it into a cone and glue ${t} under the edge with the same number, then glue it onto the body.`;
    case 'wire-boom-anchor':
      return `Lay the thread where the body is printed with ${tabs.join(', ')}, fold the anchor over it and glue ${t} there.`;
    case 'deployable-panel':
      return `Fold the hinge strip and glue ${t} onto the body where the same number is printed.`;
    case 'solar-panel':
      return `Glue it flat onto its face of the body${tabs.length > 0 ? `, with ${t}` : ''}.`;
  }
}
