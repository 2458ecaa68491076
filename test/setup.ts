// Property tests run from a fixed seed in `npm test`, so that CI is repeatable; set FC_SEED=random
// (or a number) to explore other cases. A failure prints its seed and path for replay.
import fc from 'fast-check';

const seed = process.env.FC_SEED;
if (seed !== 'random') fc.configureGlobal({ seed: seed === undefined ? 20261202 : Number(seed) });
