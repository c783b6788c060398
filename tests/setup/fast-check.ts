import fc from 'fast-check';

/*
 * Property tests draw a new seed on every local run (fast-check prints it with a counterexample; set FC_SEED
 * to replay one). CI runs them with one fixed seed, so whether a change lands never depends on the draw;
 * a counterexample found locally is kept as an explicit `examples` entry in its test.
 */
const seed = process.env.FC_SEED ? Number(process.env.FC_SEED) : process.env.CI ? 20_261_202 : undefined;
if (seed !== undefined && Number.isFinite(seed)) fc.configureGlobal({ seed });
