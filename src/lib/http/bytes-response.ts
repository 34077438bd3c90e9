/**
 * A Response whose body is bytes known when it is made, and whose body stream is made only when something
 * reads it. Node's Response (undici) builds a byte stream for every body as it is constructed, about 20–30 µs,
 * more than a small API answer takes to compute; the server's API path (src/server/api-serve.ts) writes `content`
 * to the socket directly and never asks for the stream. Anything else that reads the body (Astro under the dev
 * server, tests, `clone`) gets it from an ordinary Response of the same bytes, made on first read.
 */
export class BytesResponse extends Response {
  /** The whole body. */
  readonly content: Uint8Array<ArrayBuffer>;
  #source: Response | undefined;

  constructor(content: Uint8Array<ArrayBuffer>, init: ResponseInit) {
    super(null, init);
    this.content = content;
  }

  /** True until the body is read or its stream asked for: `content` is then the whole, unread body. */
  get bytesUnread(): boolean {
    return this.#source === undefined;
  }

  /** The ordinary Response the body is read from, made on first use. */
  source(): Response {
    return (this.#source ??= new Response(this.content));
  }

  override clone(): Response {
    if (this.bodyUsed) throw new TypeError('Response.clone: the body has already been read.');
    return new BytesResponse(this.content, this);
  }

  override arrayBuffer() {
    return this.source().arrayBuffer();
  }

  override bytes() {
    return this.source().bytes();
  }

  override blob() {
    return this.source().blob();
  }

  override formData() {
    return this.source().formData();
  }

  override json() {
    return this.source().json();
  }

  override text() {
    return this.source().text();
  }
}

// `body` and `bodyUsed` are declared as properties of Response, so a class body may not redefine them as getters.
Object.defineProperties(BytesResponse.prototype, {
  body: {
    get(this: BytesResponse) {
      return this.source().body;
    },
  },
  bodyUsed: {
    get(this: BytesResponse) {
      return !this.bytesUnread && this.source().bodyUsed;
    },
  },
});
