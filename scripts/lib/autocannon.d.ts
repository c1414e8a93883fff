/** The few parts of autocannon 9 the load test uses (the package ships no types). */
declare module "autocannon" {
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    amount?: number;
    timeout?: number;
    method?: string;
    headers?: Record<string, string>;
    body?: string;
  }
  interface Histogram {
    average: number;
    p50: number;
    p90: number;
    p99: number;
    max: number;
  }
  interface Result {
    latency: Histogram;
    requests: Histogram & { total: number };
    errors: number;
    timeouts: number;
    non2xx: number;
    "2xx": number;
    duration: number;
    statusCodeStats: Record<string, { count: number }>;
  }
  export default function autocannon(options: Options): Promise<Result>;
}
