/**
 * The beam analysis engine (pure TypeScript, no framework, no I/O). Sign convention and units:
 * lib/solver/beam/index.ts.
 */
export * from "./types";
export * from "./beam";
export { asdCombinations, lrfdCombinations } from "./asce7/combinations";
export { envelope, type Envelope, type EnvelopeRun, type EnvelopeReaction, type EnvelopeOptions, type RunExtreme } from "./envelope";
export { beamInputSchema, type BeamInputParsed } from "./schema";
