/**
 * Server adapter: a built kit file as an HTTP download (PDF, one sheet's SVG, binary or ASCII STL, JSON) with
 * a file name from the title, scale and sheet, and an ETag from the content hash so a browser revalidates
 * cheaply instead of downloading again.
 */
import { InputError } from '../errors';
import { stlAscii } from '../render/stl';
import { printPlateMesh } from '../layout/print-plate';
import type { KitBuild, KitOutput } from './build-kit';
import { kitPrintScale } from './kit-print';
import type { KitRequest } from './kit-request';

export interface KitFileOptions {
  /** The raw ?sheet= value for SVG (1-based; the first sheet when null). */
  sheet?: string | null;
  /** STL flavour. */
  stlFormat?: 'binary' | 'ascii';
  /** inline (shown in the browser, e.g. a thumbnail) or attachment (saved). */
  disposition?: 'inline' | 'attachment';
}

const TYPES: Record<KitOutput, string> = {
  pdf: 'application/pdf',
  svg: 'image/svg+xml; charset=utf-8',
  stl: 'model/stl',
  json: 'application/json; charset=utf-8',
};

/** A file-name stem like "skein-probe-1-20-letter" (ASCII letters, digits and dashes). */
export function kitFileStem(title: string, request: KitRequest): string {
  return `${kitFileWords(title)}-1-${request.scaleDenominator}-${request.sheetSizeId}`;
}

/** The title as file-name words: "Skein probe" → "skein-probe" ("kit" when nothing is left). */
function kitFileWords(title: string): string {
  const words = title
    .normalize('NFKD')
    .replace(/[^\w\s-]/g, '')
    .trim()
    .toLowerCase()
    .replace(/[\s_]+/g, '-')
    .replace(/-+/g, '-')
    .slice(0, 60);
  return words || 'kit';
}

/** Parses ?sheet=N against the kit's sheet count; 400 naming the valid range otherwise. */
export function kitSheetParam(value: string | null, sheetCount: number): number {
  const n = value === null ? 1 : Number(value);
  if (!Number.isInteger(n) || n < 1 || n > sheetCount) {
    throw new InputError(`sheet must be a whole number from 1 to ${sheetCount}; received "${value}".`, {
      sheet: [`1 to ${sheetCount}`],
    });
  }
  return n;
}

/** One output of a built kit as a file: its bytes or text, name, content type and ETag. */
export interface KitFile {
  body: string | Uint8Array;
  name: string;
  type: string;
  etag: string;
}

/** The file for one output of a built kit. */
export function kitFile(
  kitRequest: KitRequest,
  build: KitBuild,
  output: KitOutput,
  options: Omit<KitFileOptions, 'disposition'> = {},
): KitFile {
  const stem = kitFileStem(build.layout.title, kitRequest);
  const etag = `"${build.contentHash.slice(0, 32)}-${output}${options.sheet ?? ''}${options.stlFormat ?? ''}"`;
  if (output === 'svg') {
    const sheet = kitSheetParam(options.sheet ?? null, build.layout.sheets.length);
    const name = `${stem}-sheet-${sheet}-of-${build.layout.sheets.length}.svg`;
    return { body: build.svgSheets![sheet - 1]!, name, type: TYPES.svg, etag };
  }
  if (output === 'stl') {
    // The print has its own scale (the bed may need a smaller one than the paper); the name says which.
    const n = build.print?.scaleDenominator ?? kitRequest.scaleDenominator;
    const printStem = `${kitFileWords(build.layout.title)}-print-1-${n}`;
    if (options.stlFormat === 'ascii') {
      const body = stlAscii(printPlateMesh(kitPrintScale(kitRequest).plate));
      return { body, name: `${printStem}-ascii.stl`, type: 'model/stl; charset=us-ascii', etag };
    }
    return { body: build.stl!, name: `${printStem}.stl`, type: TYPES.stl, etag };
  }
  const body = output === 'json' ? build.json! : output === 'pdf' ? build.pdf! : build.stl!;
  return { body, name: `${stem}.${output}`, type: TYPES[output], etag };
}

/** The download response for one output of a built kit; 304 when the browser already has this version. */
export function kitFileResponse(
  request: Request,
  kitRequest: KitRequest,
  build: KitBuild,
  output: KitOutput,
  options: KitFileOptions = {},
): Response {
  const { body, name, type, etag } = kitFile(kitRequest, build, output, options);
  const headers: Record<string, string> = {
    'content-type': type,
    'content-disposition': `${options.disposition ?? 'attachment'}; filename="${name}"`,
    'cache-control': 'private, no-cache',
    etag,
    'x-content-type-options': 'nosniff',
  };
  if (output === 'svg') headers['content-security-policy'] = "default-src 'none'; style-src 'unsafe-inline'";
  if (request.headers.get('if-none-match') === etag) return new Response(null, { status: 304, headers });
  return new Response(body as BodyInit, { status: 200, headers });
}
