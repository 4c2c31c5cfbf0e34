/**
 * zod compiles fast validators with `new Function` when it may; to find out, it tries one, which a
 * Content-Security-Policy without 'unsafe-eval' reports as a violation. The app runs under such a
 * policy (server/middleware/security-headers.ts), so zod is told not to try. Imported first by the
 * entry (index.ts), before any schema is built (zod decides when a schema is made).
 */
import { z } from 'zod';

z.config({ jitless: true });
