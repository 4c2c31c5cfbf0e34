// The part of autocannon's API the bench uses (the package ships no types; as analysis/statistics/jstat.d.ts).
declare module 'autocannon' {
  interface Histogram {
    average: number;
    mean: number;
    max: number;
    p50: number;
    p90: number;
    p99: number;
    total: number;
  }
  export interface Result {
    latency: Histogram;
    requests: Histogram;
    throughput: Histogram;
    errors: number;
    timeouts: number;
    non2xx: number;
    duration: number;
  }
  export interface Options {
    url: string;
    connections?: number;
    duration?: number;
    amount?: number;
    /** Seconds before a request counts as an error (default 10). */
    timeout?: number;
    method?: string;
    headers?: Record<string, string>;
    body?: string | Buffer;
  }
  export interface Instance {
    stop(): void;
  }
  function autocannon(options: Options, callback: (err: Error | null, result: Result) => void): Instance;
  export default autocannon;
}
