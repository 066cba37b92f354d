import { z } from 'zod';

// zod compiles fast parsers with `new Function` after probing whether eval is allowed; under our CSP
// (script-src 'self', no 'unsafe-eval') the probe alone is reported as a violation. Interpreted parsing is enough
// for forms. Imported first by main.tsx, before any schema parses.
z.config({ jitless: true });
