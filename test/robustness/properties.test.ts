/**
 * Property-based robustness tests (fast-check): the notation parser, the document scanner and the
 * whole checker on loose math, documents of bare delimiters, and fixture notes and examples mutated
 * the way typing and pasting mutate them. A few thousand cases in all; `npm run fuzz` runs the same
 * properties with 100,000 cases or more.
 *
 * The seed is fixed so a failure replays exactly; set NOTARY_FUZZ_SEED to explore other seeds
 * (every failure report prints the seed and the shrunk counterexample).
 */
import { describe, it } from 'node:test';
import fc from 'fast-check';
import { robustnessProperties } from './properties';

const seed = Number(process.env.NOTARY_FUZZ_SEED ?? 20261202);

describe('robustness properties', () => {
  for (const p of robustnessProperties()) {
    it(p.name, () => {
      fc.assert(p.property, { numRuns: p.testRuns, seed });
    });
  }
});
