/**
 * zod compiles a fast path for object schemas with `Function(...)`, and probes whether it may by calling
 * `Function("")` once. Under the page policy (no 'unsafe-eval', app/_server/security-headers.ts) the probe fails
 * quietly — but Chromium still reports it as a policy violation. In the browser zod is told up front not to compile
 * (jitless), so nothing is attempted and nothing reported; the forms' schemas are small, so the compiled path would
 * gain nothing anyone notices. The server has no such policy and keeps the compiled path.
 */
import { z } from "zod";

if (typeof window !== "undefined") z.config({ jitless: true });
