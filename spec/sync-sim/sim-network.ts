import { NetworkError, type SimDevice } from './sim-device';
import type { SimRequest, SimResponse, SimServer } from './sim-wire';

/** What happens to one request on its way: the fault-schedule vocabulary. */
export type Fault =
  | 'ok'
  /** Lost before the server: nothing happened there. */
  | 'drop-request'
  /** The server did it; the answer is lost (a timeout, a reset connection). */
  | 'drop-response'
  /** The server committed and crashed before answering: every other request in flight fails too. */
  | 'server-crash'
  /** Answered, and a copy (a retry by a proxy, a replayed packet) arrives again later. */
  | 'duplicate'
  /** Stuck in the network: the device gives up now, the server sees it later. */
  | 'delay';

interface InFlight {
  readonly device: SimDevice;
  readonly epoch: number;
  readonly request: SimRequest;
  readonly resolve: (response: SimResponse) => void;
  readonly reject: (error: Error) => void;
}

/** Every request the server answered, in order, for replay against another server. */
export interface TraceEntry {
  readonly request: SimRequest;
  readonly response: SimResponse;
}

/**
 * The network between devices and the server. Requests wait in flight until the schedule
 * delivers one (any one: that is reordering) with a fault; delayed and duplicated copies wait
 * as "ghosts" until the schedule lets them arrive. In `auto` mode every request goes straight
 * through (the final, fault-free sync).
 */
export class SimNetwork {
  readonly inFlight: InFlight[] = [];
  readonly ghosts: SimRequest[] = [];
  readonly trace: TraceEntry[] = [];
  auto = false;

  constructor(
    private readonly server: SimServer,
    private readonly now: () => number,
  ) {}

  send(device: SimDevice, request: SimRequest): Promise<SimResponse> {
    if (this.auto) return this.serve(request);
    return new Promise((resolve, reject) => this.inFlight.push({ device, epoch: device.currentEpoch, request, resolve, reject }));
  }

  /** Delivers the in-flight request `index` (modulo how many there are) with `fault`. */
  async deliver(index: number, fault: Fault): Promise<void> {
    if (this.inFlight.length === 0) return;
    const [entry] = this.inFlight.splice(index % this.inFlight.length, 1) as [InFlight];
    // An answer for a process that has since crashed reaches no one.
    const answer = (response: SimResponse) => entry.device.currentEpoch === entry.epoch && entry.resolve(response);
    const fail = (why: string) => entry.reject(new NetworkError(why));
    switch (fault) {
      case 'drop-request':
        return fail('request lost');
      case 'delay':
        this.ghosts.push(entry.request);
        return fail('timed out');
      case 'drop-response':
        await this.serve(entry.request);
        return fail('answer lost');
      case 'server-crash':
        await this.serve(entry.request);
        fail('server crashed');
        for (const other of this.inFlight.splice(0)) other.reject(new NetworkError('server crashed'));
        return;
      case 'duplicate':
        this.ghosts.push(entry.request);
        answer(await this.serve(entry.request));
        return;
      case 'ok':
        answer(await this.serve(entry.request));
    }
  }

  /** A delayed or duplicated copy arrives now; nobody waits for its answer. */
  async deliverGhost(index: number): Promise<void> {
    if (this.ghosts.length === 0) return;
    const [request] = this.ghosts.splice(index % this.ghosts.length, 1) as [SimRequest];
    await this.serve(request);
  }

  /** Every request still in flight fails (the devices' cycles end, as after a timeout). */
  failAll(): void {
    for (const entry of this.inFlight.splice(0)) entry.reject(new NetworkError('gave up'));
  }

  private async serve(request: SimRequest): Promise<SimResponse> {
    const response = await this.server.handle(request, this.now());
    this.trace.push({ request, response });
    return response;
  }
}
