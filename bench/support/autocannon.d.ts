// The part of autocannon's API that bench:load uses (the package ships no types).
declare module "autocannon" {
  namespace autocannon {
    type Context = Record<string, number>;
    type Request = { method?: string; path?: string; headers?: Record<string, string>; body?: string };
    type Options = {
      url: string;
      connections?: number;
      duration?: number;
      method?: string;
      headers?: Record<string, string>;
      body?: string;
      requests?: Array<
        Request & {
          setupRequest?: (req: Request, context: Context) => Request;
          onResponse?: (status: number, body: string, context: Context) => void;
        }
      >;
    };
    type Histogram = { average: number; p50: number; p97_5: number; p99: number };
    type Result = {
      requests: Histogram & { total: number };
      latency: Histogram;
      non2xx: number;
      errors: number;
      timeouts: number;
    };
  }
  function autocannon(options: autocannon.Options): Promise<autocannon.Result>;
  export default autocannon;
}
