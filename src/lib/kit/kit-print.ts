/**
 * The STL's print plate for a kit request: the request's own scale when its parts fit the chosen bed, else the
 * print scale solver's answer, and the plate in words for the builder and the kit JSON (parts in gluing order,
 * what was thickened, what is used instead of a part).
 */
import { printBedLabel, printTargetOf, solvePrintScale, type PrintScale } from '../layout/print-plate';
import type { KitRequest } from './kit-request';

export interface KitPrintView {
  scaleDenominator: number;
  explanation: string;
  bedLabel: string;
  nozzleMm: number;
  parts: { step: number; label: string; attach: string; sizeMm: [number, number, number]; note?: string }[];
  substitutes: { step: number; label: string; attach: string; instead: string }[];
}

/** The plate of a request (throws InputError when no usual scale fits the bed). */
export function kitPrintScale(request: Pick<KitRequest, 'model' | 'scaleDenominator' | 'print'>): PrintScale {
  return solvePrintScale(request.model, printTargetOf(request.print), request.scaleDenominator);
}

/** The plate in words and numbers (sizes rounded to 0.1 mm). */
export function kitPrintView(request: Pick<KitRequest, 'print'>, print: PrintScale): KitPrintView {
  const { plate } = print;
  return {
    scaleDenominator: plate.scaleDenominator,
    explanation: print.explanation,
    bedLabel: printBedLabel(request.print),
    nozzleMm: request.print.nozzleMm,
    parts: plate.parts.map((p) => ({
      step: p.step,
      label: p.label,
      attach: p.attach,
      sizeMm: p.sizeMm.map((v) => Math.round(v * 10) / 10) as [number, number, number],
      ...(p.note ? { note: p.note } : {}),
    })),
    substitutes: plate.substitutes.map(({ step, label, attach, instead }) => ({ step, label, attach, instead })),
  };
}
