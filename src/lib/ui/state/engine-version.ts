/** The engine's version string, in a module of its own so it can be loaded on demand. */
export { ENGINE_VERSION } from '$lib/engine/report/version';
