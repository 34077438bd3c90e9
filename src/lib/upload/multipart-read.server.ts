/**
 * Streamed multipart/form-data uploads (busboy): the request is never held in memory whole. Each file part is
 * handed to the caller as a stream, one part at a time in the order sent, while the parser waits (back
 * pressure) — so memory stays at one part being handled plus the parser's buffers, however large the request.
 * Limits are checked as bytes arrive: over the request, file, file-count or field limits the upload stops
 * with a 413 that says which limit; a body that is not multipart, or is malformed, is a 400.
 */
import { Readable } from 'node:stream';
import busboy from 'busboy';
import { InputError, PayloadTooLargeError } from '../errors';
import { formatBytes } from '../http/respond';

/** The limits of one upload route (every route states its own; no defaults for files). */
export interface UploadLimits {
  /** Largest file part, bytes. */
  fileBytesMax: number;
  /** Most file parts in one request. */
  filesMax: number;
  /** Largest request body, bytes (all parts and framing). */
  requestBytesMax: number;
  /** Largest text field value, bytes. Default 10 kB. */
  fieldBytesMax?: number;
  /** Most text fields. Default 50. */
  fieldsMax?: number;
  /** What the files are called in messages ("photo", "mesh file"). Default "file". */
  fileNoun?: string;
}

/** One file part as it arrives: its form field, the name the client gave it, and its bytes as a stream. */
export interface UploadFilePart {
  field: string;
  /** The client's file name: for messages only (the name decides nothing). */
  filename: string;
  /** The client's declared media type: for messages only (the bytes decide the type). */
  declaredType: string;
  /** 0-based position among the file parts. */
  index: number;
  /** The part's bytes; errors with PayloadTooLargeError when the part passes fileBytesMax. */
  stream: Readable;
}

/** What an upload gave: text fields (every value of a repeated name, in order) and the handlers' results. */
export interface UploadResult<T> {
  fields: Record<string, string[]>;
  files: T[];
}

const FIELD_BYTES_DEFAULT = 10_000;
const FIELDS_DEFAULT = 50;

/**
 * Reads a multipart request, calling `onFile` for each file part in turn (the next part waits until the
 * handler's promise settles). Rejects with the first error: a limit (413), a malformed body (400), or the
 * handler's own error; the rest of the request is then discarded unread.
 */
export async function multipartRead<T>(
  request: Request,
  limits: UploadLimits,
  onFile: (part: UploadFilePart) => Promise<T>,
): Promise<UploadResult<T>> {
  const noun = limits.fileNoun ?? 'file';
  const contentType = request.headers.get('content-type') ?? '';
  if (!/^multipart\/form-data\b/i.test(contentType)) {
    throw new InputError(
      `Send the ${noun}s as multipart/form-data (a file upload form); received "${contentType || 'no content type'}".`,
    );
  }
  const declared = Number(request.headers.get('content-length') ?? NaN);
  if (Number.isFinite(declared) && declared > limits.requestBytesMax) {
    throw new PayloadTooLargeError(requestTooLargeMessage(limits.requestBytesMax, noun));
  }
  if (!request.body) throw new InputError(`The request has no body; attach at least one ${noun}.`);

  let parser: busboy.Busboy;
  try {
    parser = busboy({
      headers: { 'content-type': contentType },
      limits: {
        fileSize: limits.fileBytesMax,
        files: limits.filesMax,
        fields: limits.fieldsMax ?? FIELDS_DEFAULT,
        fieldSize: limits.fieldBytesMax ?? FIELD_BYTES_DEFAULT,
      },
    });
  } catch {
    throw new InputError('The multipart request has no boundary; send it as a form upload.');
  }

  const source = Readable.fromWeb(request.body as import('node:stream/web').ReadableStream<Uint8Array>);
  const fields: Record<string, string[]> = {};
  const files: T[] = [];
  let failure: unknown;
  let chain: Promise<void> = Promise.resolve();
  let fileIndex = 0;
  let received = 0;
  /** File streams not yet ended, stopped with the error when the upload fails so no handler waits forever. */
  const open = new Set<Readable>();

  return new Promise<UploadResult<T>>((resolve, reject) => {
    const fail = (err: unknown) => {
      if (failure !== undefined) return;
      failure = err;
      source.unpipe(parser);
      for (const stream of open) stream.destroy(err instanceof Error ? err : undefined);
      // Read the rest of the body and drop it (the data listener still stops it past the request limit), so the
      // client gets the error answer on a connection that stays usable instead of a reset mid-upload.
      source.resume();
      reject(err);
    };

    source.on('data', (chunk: Buffer) => {
      received += chunk.byteLength;
      if (received > limits.requestBytesMax) {
        fail(new PayloadTooLargeError(requestTooLargeMessage(limits.requestBytesMax, noun)));
        source.destroy();
      }
    });
    source.on('error', (err) => fail(new InputError(`The upload was cut off before it ended (${err.message}).`)));

    parser.on('field', (name, value, info) => {
      if (info.valueTruncated) {
        fail(
          new PayloadTooLargeError(
            `The form field "${name}" is longer than the ${formatBytes(limits.fieldBytesMax ?? FIELD_BYTES_DEFAULT)} it may hold.`,
          ),
        );
        return;
      }
      (fields[name] ??= []).push(value);
    });

    parser.on('file', (field, stream, info) => {
      const part: UploadFilePart = {
        field,
        filename: info.filename ?? '',
        declaredType: info.mimeType,
        index: fileIndex++,
        stream,
      };
      open.add(stream);
      // The handler sees errors through its reads; this keeps a stream stopped before its turn from crashing.
      stream.on('error', () => {});
      stream.on('close', () => open.delete(stream));
      stream.on('end', () => open.delete(stream));
      stream.on('limit', () => {
        const err = new PayloadTooLargeError(
          `${label(part, noun)} is larger than the ${formatBytes(limits.fileBytesMax)} a ${noun} may be.`,
        );
        stream.destroy(err);
        fail(err);
      });
      chain = chain.then(async () => {
        if (failure !== undefined) {
          stream.resume();
          return;
        }
        try {
          files[part.index] = await onFile(part);
        } catch (err) {
          fail(err);
        } finally {
          // A handler that stopped reading early must not stall the parser.
          if (!stream.destroyed) stream.resume();
        }
      });
    });

    parser.on('filesLimit', () =>
      fail(
        new PayloadTooLargeError(
          `Send at most ${limits.filesMax} ${noun}${limits.filesMax === 1 ? '' : 's'} at a time.`,
        ),
      ),
    );
    parser.on('fieldsLimit', () =>
      fail(new PayloadTooLargeError(`The form has more than ${limits.fieldsMax ?? FIELDS_DEFAULT} fields.`)),
    );
    parser.on('error', (err: Error) =>
      fail(new InputError(`The multipart body could not be read (${err.message}); send it as a form upload.`)),
    );
    parser.on('close', () => {
      void chain.then(() => {
        if (failure === undefined) resolve({ fields, files });
      });
    });

    source.pipe(parser);
  });
}

/** Reads a stream into one Buffer; PayloadTooLargeError once it passes `capBytes`. */
export async function streamReadCapped(stream: Readable, capBytes: number, what = 'The file'): Promise<Buffer> {
  const chunks: Buffer[] = [];
  let total = 0;
  for await (const chunk of stream) {
    total += (chunk as Buffer).byteLength;
    if (total > capBytes) {
      stream.destroy();
      throw new PayloadTooLargeError(`${what} is larger than the ${formatBytes(capBytes)} it may be.`);
    }
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks, total);
}

function label(part: UploadFilePart, noun: string): string {
  return part.filename ? `"${part.filename}"` : `The ${noun} in position ${part.index + 1}`;
}

function requestTooLargeMessage(limitBytes: number, noun: string): string {
  return `This upload is larger than the ${formatBytes(limitBytes)} one request may carry; send the ${noun}s in smaller groups.`;
}
