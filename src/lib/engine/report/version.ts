/** Version of the engine, recorded in every report (semantic versioning). */
export const ENGINE_VERSION = '0.2.0';
