import { z } from 'zod';

// zod 4 compiles object schemas with `new Function` when it may; the Content-Security-Policy
// forbids eval, so the browser would report a violation before zod falls back. Ask for the
// interpreter from the start.
z.config({ jitless: true });
