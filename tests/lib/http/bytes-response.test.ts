/** BytesResponse against Node's own Response of the same bytes: the same body by every reading method. */
import { describe, expect, it } from 'vitest';
import { BytesResponse } from '../../../src/lib/http/bytes-response';

const content = new TextEncoder().encode(JSON.stringify({ kits: [{ id: 'k1', title: 'Relay — 1:20' }] }));
const init = { status: 201, headers: { 'content-type': 'application/json', 'content-length': String(content.length) } };
const pair = () => ({ ours: new BytesResponse(content, init), node: new Response(content, init) });

describe('BytesResponse', () => {
  it('has the status and headers it was given, and its bytes unread until something reads it', () => {
    const { ours, node } = pair();
    expect(ours).toBeInstanceOf(Response);
    expect(ours.status).toBe(node.status);
    expect([...ours.headers]).toEqual([...node.headers]);
    expect(ours.bytesUnread).toBe(true);
    expect(ours.bodyUsed).toBe(false);
  });

  it('gives the same body as text, JSON, bytes, array buffer, blob and stream', async () => {
    const reads: ((r: Response) => Promise<unknown>)[] = [
      (r) => r.text(),
      (r) => r.json(),
      async (r) => [...(await r.bytes())],
      async (r) => [...new Uint8Array(await r.arrayBuffer())],
      async (r) => (await r.blob()).text(),
      async (r) => new Response(r.body).text(),
    ];
    for (const read of reads) {
      const { ours, node } = pair();
      expect(await read(ours)).toEqual(await read(node));
      expect(ours.bodyUsed).toBe(node.bodyUsed);
      expect(ours.bytesUnread).toBe(false);
    }
  });

  it('refuses a second read and a clone after reading, as Response does', async () => {
    const { ours, node } = pair();
    await ours.text();
    await node.text();
    await expect(ours.text()).rejects.toThrow(TypeError);
    await expect(node.text()).rejects.toThrow(TypeError);
    expect(() => ours.clone()).toThrow(TypeError);
    expect(() => node.clone()).toThrow(TypeError);
  });

  it('clones before reading into an equal, independent response', async () => {
    const { ours } = pair();
    const copy = ours.clone();
    expect(await copy.text()).toBe(await ours.text());
    expect(copy.status).toBe(201);
  });
});
