/**
 * What an imported model makes as a kit (MeshKitSummary), as sentences for a teacher deciding on a scale:
 * pieces, sheets, cut length, glue tabs, taped edges, faces too large for the sheet and the fold-back check.
 */
import type { MeshKitSummary } from '../kit/mesh-kit-summary';
import { lengthLabel } from '../layout/units';

const COUNT = new Intl.NumberFormat('en-US');

function count(n: number, one: string, many: string): string {
  return `${COUNT.format(n)} ${n === 1 ? one : many}`;
}

/** One sentence per figure of the summary, for a kit at 1:scale on sheets named `sheetLabel`. */
export function meshKitSummaryWords(summary: MeshKitSummary, scaleDenominator: number, sheetLabel: string): string[] {
  const metric = (mm: number) => lengthLabel(mm, 'metric');
  return [
    `At 1:${scaleDenominator} the model's longest side is ${metric(summary.sizeMm)}.`,
    `${count(summary.pieceCount, 'piece', 'pieces')} to cut out, from ${count(summary.faceCount, 'face', 'faces')}.`,
    `${count(summary.sheetCount, 'sheet', 'sheets')} of ${sheetLabel}.`,
    `${metric(summary.cutLengthMm)} of cutting in all, tabs included.`,
    `${count(summary.tabCount, 'glue tab', 'glue tabs')} (${metric(summary.tabDepthMm)} deep on this paper).`,
    summary.tapedEdgeCount > 0
      ? `${count(summary.tapedEdgeCount, 'edge has', 'edges have')} no room for a tab: tape ${summary.tapedEdgeCount === 1 ? 'it' : 'them'}.`
      : 'Every glued edge has a tab: no tape needed.',
    summary.oversizeFaceCount > 0
      ? `${count(summary.oversizeFaceCount, 'face is', 'faces are')} larger than the sheet: choose a smaller scale or a bigger sheet.`
      : 'Every face fits on the sheet.',
    summary.foldBackOk
      ? `Fold-back check passed: folded along its folds, every piece lands back on the model.`
      : `Fold-back check failed: a folded piece misses the model by up to ${metric(summary.foldBackDeviationMm)}; try the full mesh or import the file again.`,
  ];
}
