/** The part of autocannon 9 that scripts/bench/bench-api.ts uses (the package ships no types). */
declare module 'autocannon' {
  import type { EventEmitter } from 'node:events';

  interface AutocannonOptions {
    url: string;
    connections?: number;
    duration?: number;
    pipelining?: number;
    method?: string;
    headers?: Record<string, string>;
  }

  interface Histogram {
    average: number;
    p50: number;
    p99: number;
    total: number;
  }

  interface AutocannonResult {
    requests: Histogram;
    latency: Histogram;
    duration: number;
    errors: number;
    timeouts: number;
    non2xx: number;
  }

  interface AutocannonInstance extends EventEmitter {
    /** `responseTime` is in milliseconds. */
    on(event: 'response', listener: (client: unknown, statusCode: number, resBytes: number, responseTime: number) => void): this;
    stop(): void;
  }

  function autocannon(options: AutocannonOptions, callback: (error: Error | null, result: AutocannonResult) => void): AutocannonInstance;

  export default autocannon;
  export type { AutocannonOptions, AutocannonResult, AutocannonInstance };
}
