// zod compiles object parsers with `new Function` where it may, and first probes whether it may; the
// app's content security policy (server/http/security-headers.ts) refuses eval, and Chromium reports
// even the caught probe as a violation. Without the compiler, parsing is plain code, a little slower.
// This runs as a polyfill, before the app's chunks, some of which parse with zod as they load; it sets
// zod's configuration through the global object zod itself reads it from, so zod is not loaded here.
const scope = globalThis as { __zod_globalConfig?: Record<string, unknown> };
scope.__zod_globalConfig = { ...scope.__zod_globalConfig, jitless: true };

export {};
