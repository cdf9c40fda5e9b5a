// rate-limiter-flexible declares RateLimiterStoreAbstract in its types but does not export it from
// its index at run time; custom stores import it from its own file.
declare module 'rate-limiter-flexible/lib/RateLimiterStoreAbstract' {
  import type { RateLimiterStoreAbstract } from 'rate-limiter-flexible';
  const StoreAbstract: typeof RateLimiterStoreAbstract;
  export = StoreAbstract;
}
