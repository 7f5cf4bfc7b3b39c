/**
 * Property tests explore fresh random cases on a developer's machine, but CI runs a fixed seed so a
 * submission's result is reproducible. Set FC_SEED to replay a reported failure (fast-check prints
 * the seed of every failing property).
 */
import fc from 'fast-check';

const fromEnv = process.env.FC_SEED;
const seed = fromEnv ? Number(fromEnv) : process.env.CI ? 20261201 : undefined;
if (seed !== undefined && Number.isFinite(seed)) fc.configureGlobal({ seed });
