/**
 * The assembly room: how a design is built, step by step. Pure TypeScript (no React, three.js or
 * storage). Lengths mm, masses kg, directions unit vectors in design space (Y up, front is -Z).
 *
 * - `sequenceOf(design, catalogue)`: the design's sequence: its saved steps (`design.steps`), or a
 *   generated one when none are saved, enriched per step with parts by role, hardware, hex keys,
 *   cautions, mass and per-part motions (insertion direction and explode offset).
 * - `generateSequence(design, catalogue)`: a fresh generated sequence, ignoring saved steps.
 * - `generateSteps(design, catalogue)`: the generated order as document steps (what is saved).
 * - `buildSequence(design, steps, catalogue)`: enrich any list of document steps (e.g. a preview
 *   of an edit before it is applied).
 * - `sequenceFindings(ctx)`: the feasibility check (run by `analyzeDesign`); findings name both
 *   steps and the parts, with a fix.
 * - `hexKeysFor(fasteners)`: hex keys for screws, by standard (ASME B18.3, ISO 4762, 7380-1, 10642).
 *
 * Types (`SequenceStep`, `AssemblySequence`, `PartMotion`, `TNutMotion`, `StepTool`,
 * `StepCaution`, `StepHardware`) are the one source for steps: import them from here.
 */
export * from './types';
export { generateSteps } from './generateSteps';
export { buildSequence, generateSequence, hexKeysFor, sequenceOf, TWO_PERSON_LIFT_KG } from './sequence';
export { computeMotions, profileMid } from './motions';
export { sequenceFindings } from './sequenceFindings';
