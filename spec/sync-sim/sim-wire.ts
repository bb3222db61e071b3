import type { PushRequest } from '../../shared/api/sync';

/** One request of the sync wire contract, as a simulated network carries it. */
export type SimRequest =
  { readonly kind: 'push'; readonly body: PushRequest } | { readonly kind: 'pull'; readonly since: string | undefined; readonly limit: number };

/** An HTTP answer: status and parsed JSON body. */
export interface SimResponse {
  readonly status: number;
  /** The server's time as its HTTP Date header gives it (every answer, errors too). */
  readonly dateMs?: number;
  readonly body: any; // eslint-disable-line @typescript-eslint/no-explicit-any -- the wire's JSON, read by the device as the app reads it
}

/** A sync server as the simulation sees it: the in-memory model, or the real one over HTTP. */
export interface SimServer {
  handle(request: SimRequest, nowMs: number): Promise<SimResponse>;
}

/**
 * The real server (any instance) over HTTP with one reader's token. It judges clocks by its own
 * time, but the time it tells the device (`serverTime`, the Date header) is the simulation's
 * `nowMs`: simulated time runs ahead of the wall clock (ticks), and a device must learn the same
 * offset from both servers for their answers to be compared. Skews stay far from the 24 h limit,
 * so the few minutes between the two never change a verdict.
 */
export class HttpSimServer implements SimServer {
  constructor(
    private readonly baseUrl: () => string,
    private readonly accessToken: string,
    private readonly timeoutMs = 30_000,
  ) {}

  async handle(request: SimRequest, nowMs = Date.now()): Promise<SimResponse> {
    const headers = { 'content-type': 'application/json', authorization: `Bearer ${this.accessToken}` };
    const signal = AbortSignal.timeout(this.timeoutMs);
    const res =
      request.kind === 'push'
        ? await fetch(`${this.baseUrl()}/api/sync/push`, { method: 'POST', headers, body: JSON.stringify(request.body), signal })
        : await fetch(
            `${this.baseUrl()}/api/sync/pull?${new URLSearchParams({ ...(request.since ? { since: request.since } : {}), limit: String(request.limit) })}`,
            { headers, signal },
          );
    const text = await res.text();
    const body = text ? JSON.parse(text) : null;
    const serverTime = new Date(nowMs).toISOString();
    return { status: res.status, dateMs: nowMs, body: body && typeof body.serverTime === 'string' ? { ...body, serverTime } : body };
  }
}
