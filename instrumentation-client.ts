import { z } from 'zod';

/**
 * Runs in the browser before any page code. zod 4 decides, when each object
 * schema is built, whether it may compile fast parsers with `new Function`,
 * by probing eval. Under the pages' Content-Security-Policy (no 'unsafe-eval',
 * lib/edge/page-content-security-policy.ts) the probe fails quietly, but the
 * browser still reports it as a policy violation. Jitless mode skips the probe
 * and the compiled parsers; it has to be set before the first schema is built,
 * which is why it lives here and not in the modules that use zod.
 */
z.config({ jitless: true });
