/**
 * Imported for its effect by the schema modules that client code also loads (question banks,
 * answers, and the scenario the stage diagrams parse at import).
 * Our Content-Security-Policy gives scripts no 'unsafe-eval'. zod compiles object parsers with
 * `new Function` where it may, and its first parse probes for that: in a browser the probe is a
 * CSP violation the browser reports as an issue (Lighthouse "best practices", the quiz page).
 * `jitless` is zod's documented switch for environments that disallow eval; the server keeps
 * its compiled parsers.
 */
import { z } from "zod";

if (typeof window !== "undefined") z.config({ jitless: true });
