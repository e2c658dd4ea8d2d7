// Runs in the browser before the app's own code. zod 4 compiles fast parsers with `new Function` and probes for
// it first; the site's Content-Security-Policy allows no eval, so even that probe is reported as a violation.
// Jitless parsing (zod's `config({ jitless: true })`) skips the probe and the compiled path, with the same
// results. zod keeps that configuration on `globalThis.__zod_globalConfig` (zod/v4/core/core.js), shared by every
// copy of zod on the page; setting it here, before any schema is built, costs a few bytes where importing
// zod's `config` would put zod's core into every page. tests/security/zod-jitless.test.ts proves the installed
// zod reads it.
type ZodGlobal = typeof globalThis & { __zod_globalConfig?: { jitless?: boolean } };

const shared = globalThis as ZodGlobal;
shared.__zod_globalConfig ??= {};
shared.__zod_globalConfig.jitless = true;

export {};
