import { z } from "zod";

// Runs before the page hydrates. zod probes `new Function` to compile parsers; under our CSP (no
// 'unsafe-eval', src/lib/security-headers.ts) the probe is refused and reported as a violation, so
// the browser parses without it.
z.config({ jitless: true });
