/**
 * The streamed multipart reader. Bodies are encoded by the platform's own FormData (undici, the WHATWG fetch
 * implementation in Node), an encoder independent of the parser under test (busboy).
 */
import { describe, expect, it } from 'vitest';
import { InputError, PayloadTooLargeError } from '../../../src/lib/errors';
import { multipartRead, streamReadCapped, type UploadLimits } from '../../../src/lib/upload/multipart-read.server';

const LIMITS: UploadLimits = { fileBytesMax: 1000, filesMax: 3, requestBytesMax: 5000, fileNoun: 'photo' };

function formRequest(parts: [string, string | Blob, string?][]): Request {
  const form = new FormData();
  for (const [name, value, filename] of parts) {
    if (typeof value === 'string') form.append(name, value);
    else form.append(name, value, filename);
  }
  return new Request('http://localhost/upload', { method: 'POST', body: form });
}

/** A request whose body arrives in the given chunks, without a Content-Length (as a chunked upload does). */
async function chunkedRequest(source: Request, chunkBytes: number, onChunk?: (i: number) => Promise<void>) {
  const bytes = new Uint8Array(await source.arrayBuffer());
  let i = 0;
  const body = new ReadableStream<Uint8Array>({
    async pull(controller) {
      if (i * chunkBytes >= bytes.byteLength) return controller.close();
      await onChunk?.(i);
      controller.enqueue(bytes.subarray(i * chunkBytes, (i + 1) * chunkBytes));
      i++;
    },
  });
  const request = new Request('http://localhost/upload', {
    method: 'POST',
    body,
    headers: { 'content-type': source.headers.get('content-type')! },
    duplex: 'half',
  } as RequestInit);
  return Object.assign(request, { chunkCount: Math.ceil(bytes.byteLength / chunkBytes) });
}

const blob = (n: number, fill = 97) => new Blob([new Uint8Array(n).fill(fill)]);
const readAll = (part: { stream: NodeJS.ReadableStream }) => streamReadCapped(part.stream as never, 10_000);

describe('multipartRead', () => {
  it('hands each file to the handler in order with its name, and collects repeated fields in order', async () => {
    const request = formRequest([
      ['altText', 'first'],
      ['photo', blob(10, 65), 'a.jpg'],
      ['altText', 'second'],
      ['photo', blob(20, 66), 'b.png'],
    ]);
    const out = await multipartRead(request, LIMITS, async (part) => ({
      name: part.filename,
      index: part.index,
      text: (await readAll(part)).toString(),
    }));
    expect(out.fields).toEqual({ altText: ['first', 'second'] });
    expect(out.files).toEqual([
      { name: 'a.jpg', index: 0, text: 'A'.repeat(10) },
      { name: 'b.png', index: 1, text: 'B'.repeat(20) },
    ]);
  });

  it('refuses a file over the file limit with 413 naming the file and the limit', async () => {
    const request = formRequest([['photo', blob(1001), 'big.jpg']]);
    const err = await multipartRead(request, LIMITS, readAll).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(PayloadTooLargeError);
    expect((err as Error).message).toBe('"big.jpg" is larger than the 1 kB a photo may be.');
  });

  it('refuses more files than the limit with 413', async () => {
    const request = formRequest([1, 2, 3, 4].map((i): [string, Blob, string] => ['photo', blob(5), `${i}.jpg`]));
    await expect(multipartRead(request, LIMITS, readAll)).rejects.toThrow('Send at most 3 photos at a time.');
  });

  it('refuses a request over the request limit while it streams, even without a Content-Length', async () => {
    const source = formRequest([1, 2, 3].map((i): [string, Blob, string] => ['photo', blob(900), `${i}.jpg`]));
    const request = await chunkedRequest(source, 256);
    expect(request.headers.get('content-length')).toBeNull();
    const limits = { ...LIMITS, requestBytesMax: 2000 };
    await expect(multipartRead(request, limits, readAll)).rejects.toThrow(PayloadTooLargeError);
  });

  it('refuses at once a declared Content-Length over the request limit', async () => {
    const request = new Request('http://localhost/upload', {
      method: 'POST',
      body: 'x',
      headers: { 'content-type': 'multipart/form-data; boundary=b', 'content-length': '999999' },
    });
    await expect(multipartRead(request, LIMITS, readAll)).rejects.toThrow(/larger than the 5 kB one request may carry/);
  });

  it('answers 400 for a body that is not multipart, has no boundary, or is cut off', async () => {
    const json = new Request('http://localhost/u', {
      method: 'POST',
      body: '{}',
      headers: { 'content-type': 'application/json' },
    });
    await expect(multipartRead(json, LIMITS, readAll)).rejects.toThrow(InputError);
    const noBoundary = new Request('http://localhost/u', {
      method: 'POST',
      body: 'x',
      headers: { 'content-type': 'multipart/form-data' },
    });
    await expect(multipartRead(noBoundary, LIMITS, readAll)).rejects.toThrow(InputError);
    const full = formRequest([['photo', blob(50), 'a.jpg']]);
    const bytes = new Uint8Array(await full.arrayBuffer());
    const cut = new Request('http://localhost/u', {
      method: 'POST',
      body: bytes.subarray(0, bytes.byteLength - 30),
      headers: { 'content-type': full.headers.get('content-type')! },
    });
    await expect(multipartRead(cut, LIMITS, readAll)).rejects.toThrow(InputError);
  });

  it("stops at the handler's error and calls no later handler", async () => {
    const request = formRequest([
      ['photo', blob(5), '1.jpg'],
      ['photo', blob(5), '2.jpg'],
    ]);
    const seen: string[] = [];
    const err = await multipartRead(request, LIMITS, async (part) => {
      seen.push(part.filename);
      throw new InputError(`bad ${part.filename}`);
    }).catch((e: unknown) => e);
    expect((err as Error).message).toBe('bad 1.jpg');
    expect(seen).toEqual(['1.jpg']);
  });

  it('gives the first file to its handler before the rest of the request has arrived', async () => {
    const source = formRequest([
      ['photo', blob(600), '1.jpg'],
      ['photo', blob(600), '2.jpg'],
    ]);
    let chunksSent = 0;
    const request = await chunkedRequest(source, 100, async (i) => {
      chunksSent = i;
    });
    const sentWhenHandled: number[] = [];
    await multipartRead(request, { ...LIMITS, fileBytesMax: 10_000 }, async (part) => {
      sentWhenHandled.push(chunksSent);
      return readAll(part);
    });
    expect(request.chunkCount).toBeGreaterThan(12);
    expect(sentWhenHandled[0]).toBeLessThan(request.chunkCount / 2);
  });
});

describe('streamReadCapped', () => {
  it('reads a stream whole up to the cap and refuses one byte more', async () => {
    const { Readable } = await import('node:stream');
    expect((await streamReadCapped(Readable.from([Buffer.alloc(5), Buffer.alloc(5)]), 10)).byteLength).toBe(10);
    await expect(streamReadCapped(Readable.from([Buffer.alloc(6), Buffer.alloc(5)]), 10, 'The mesh')).rejects.toThrow(
      'The mesh is larger than the 10 bytes it may be.',
    );
  });
});
