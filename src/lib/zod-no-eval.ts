// The content security policy forbids eval, so zod must neither compile its parsers with
// Function() nor probe whether it may (the probe alone is reported as a policy violation).
// Imported first by every entry and worker.
import { z } from 'zod';

z.config({ jitless: true });
