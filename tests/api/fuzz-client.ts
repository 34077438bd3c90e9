/**
 * The fuzz suite's HTTP client: node:http, so a path goes out byte for byte as written (fetch would resolve
 * `%2e%2e` and `..` itself), from a loopback address of its own (FUZZ_LOCAL_ADDRESS), so the per-IP rate limits
 * it trips never slow the other test files, which call from 127.0.0.1. Also a raw socket for request lines no
 * HTTP client would write.
 */
import { Agent, request } from 'node:http';
import { connect } from 'node:net';
import { BASE_URL } from './harness';

/** The fuzz suite's own source address on the loopback network (127.0.0.0/8 all reaches this host). */
export const FUZZ_LOCAL_ADDRESS = '127.0.0.73';

/** Longest wait for an answer before the case fails (far above the 2 s the suite asserts). */
const ANSWER_WAIT_MS = 15_000;

const target = new URL(BASE_URL);
/**
 * Idle kept-alive sockets are closed after this, well before the server's own keep-alive timeout (Node's 5 s):
 * a socket reused just as the server closes it fails with "socket hang up", the client's race, not the server's.
 */
const IDLE_SOCKET_MS = 2_000;
const agent = new Agent({ keepAlive: true, maxSockets: 8, timeout: IDLE_SOCKET_MS, localAddress: FUZZ_LOCAL_ADDRESS });

export interface FuzzRequest {
  method: string;
  /** The request target as it goes on the wire: path and query, already percent-encoded where needed. */
  path: string;
  headers?: Record<string, string>;
  body?: string | Buffer;
}

export interface FuzzAnswer {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  text: string;
  /** From the request's start to the answer's last byte. */
  ms: number;
}

/** Sends one request and reads the whole answer. */
export function fuzzSend(r: FuzzRequest): Promise<FuzzAnswer> {
  const started = performance.now();
  return new Promise((resolve, reject) => {
    const req = request(
      {
        host: target.hostname,
        port: target.port,
        method: r.method,
        path: r.path,
        agent,
        // Content-Length always: node:http sends a GET or DELETE body with neither it nor chunked framing.
        headers: { origin: BASE_URL, 'content-length': String(r.body ? Buffer.byteLength(r.body) : 0), ...r.headers },
      },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('error', reject);
        // A connection closed before the answer's end is a failure, not a wait forever.
        res.on('close', () => {
          if (!res.complete) reject(new Error(`${r.method} ${r.path.slice(0, 120)}: connection closed mid-answer`));
        });
        res.on('end', () =>
          resolve({
            status: res.statusCode ?? 0,
            headers: res.headers,
            text: Buffer.concat(chunks).toString('utf8'),
            ms: performance.now() - started,
          }),
        );
      },
    );
    req.on('error', reject);
    req.setTimeout(ANSWER_WAIT_MS, () =>
      req.destroy(new Error(`${r.method} ${r.path.slice(0, 120)}: no answer within ${ANSWER_WAIT_MS} ms`)),
    );
    req.end(r.body);
  });
}

/** Writes a raw request head (CRLFs included) on a fresh socket; answers the status line and the rest as text. */
export function fuzzSendRaw(head: string): Promise<{ statusLine: string; text: string; ms: number }> {
  const started = performance.now();
  return new Promise((resolve, reject) => {
    const socket = connect({ host: target.hostname, port: Number(target.port), localAddress: FUZZ_LOCAL_ADDRESS });
    const chunks: Buffer[] = [];
    socket.on('data', (c: Buffer) => chunks.push(c));
    socket.on('error', reject);
    socket.on('end', () => {
      const text = Buffer.concat(chunks).toString('latin1');
      resolve({ statusLine: text.split('\r\n')[0] ?? '', text, ms: performance.now() - started });
    });
    socket.setTimeout(5_000, () => socket.destroy(new Error('no answer within 5 s')));
    socket.end(head);
  });
}

/** Closes the kept-alive sockets. */
export function fuzzClientClose(): void {
  agent.destroy();
}
