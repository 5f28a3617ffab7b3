import fc from 'fast-check';

// A fixed seed keeps `npm test` repeatable; FC_SEED=random explores new cases (run it often by hand).
const seed = process.env.FC_SEED;
if (seed !== 'random') fc.configureGlobal({ seed: seed ? Number(seed) : 20261202 });
