// Minimal types for autocannon 8 (the package ships none), covering what scripts/bench-api.ts uses.
declare module "autocannon" {
  import type { EventEmitter } from "node:events";

  /** hdr-histogram summary as autocannon reports it. */
  export interface Histogram {
    min: number;
    max: number;
    average: number;
    stddev: number;
    p50: number;
    p90: number;
    p97_5: number;
    p99: number;
  }

  export interface Result {
    requests: Histogram;
    latency: Histogram;
    throughput: Histogram;
    /** Seconds. */
    duration: number;
    errors: number;
    timeouts: number;
    non2xx: number;
    statusCodeStats?: Record<string, { count: number }>;
  }

  export interface RequestSpec {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
    body?: string;
    setupRequest?: (request: RequestSpec, context: Record<string, unknown>) => RequestSpec | undefined;
    onResponse?: (status: number, body: string, context: Record<string, unknown>, headers: Record<string, string>) => void;
  }

  export interface Options {
    url: string;
    connections?: number;
    /** Seconds. */
    duration?: number;
    /** Seconds before a request counts as timed out. */
    timeout?: number;
    method?: string;
    headers?: Record<string, string>;
    body?: string;
    requests?: RequestSpec[];
    warmup?: { connections?: number; duration?: number };
  }

  export interface Instance extends EventEmitter, PromiseLike<Result> {
    on(event: "response", listener: (client: unknown, statusCode: number, resBytes: number, responseTime: number) => void): this;
    on(event: string, listener: (...args: unknown[]) => void): this;
  }

  function autocannon(options: Options): Instance;
  export default autocannon;
}
