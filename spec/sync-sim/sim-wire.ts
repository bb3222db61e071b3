import type { PushRequest } from '../../shared/sync/field-change';

/** One request of the sync wire contract, as a simulated network carries it. */
export type SimRequest =
  { readonly kind: 'push'; readonly body: PushRequest } | { readonly kind: 'pull'; readonly since: string | undefined; readonly limit: number };

/** An HTTP answer: status and parsed JSON body. */
export interface SimResponse {
  readonly status: number;
  readonly body: any; // eslint-disable-line @typescript-eslint/no-explicit-any -- the wire's JSON, read by the device as the app reads it
}

/** A sync server as the simulation sees it: the in-memory model, or the real one over HTTP. */
export interface SimServer {
  handle(request: SimRequest, nowMs: number): Promise<SimResponse>;
}

/** The real server (any instance) over HTTP with one reader's token; `nowMs` is the real clock there. */
export class HttpSimServer implements SimServer {
  constructor(
    private readonly baseUrl: () => string,
    private readonly accessToken: string,
    private readonly timeoutMs = 30_000,
  ) {}

  async handle(request: SimRequest): Promise<SimResponse> {
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
    return { status: res.status, body: text ? JSON.parse(text) : null };
  }
}
