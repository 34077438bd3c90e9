/**
 * Server adapter: reads the shipped KitwrightSans subset (assets/fonts) once per process for pdfKit and
 * buildKit. The only file of src/lib/kit that touches node:*.
 */
import { readFile } from 'node:fs/promises';
import type { PdfFonts } from '../render/pdf-kit';

let cached: Promise<PdfFonts> | undefined;

/** The regular and bold font bytes; `root` is the repository root (the process's working folder by default). */
export function kitFonts(root: string = process.cwd()): Promise<PdfFonts> {
  cached ??= Promise.all([
    readFile(`${root}/assets/fonts/KitwrightSans-Regular.ttf`),
    readFile(`${root}/assets/fonts/KitwrightSans-Bold.ttf`),
  ]).then(([regular, bold]) => ({ fontRegular: new Uint8Array(regular), fontBold: new Uint8Array(bold) }));
  return cached;
}
