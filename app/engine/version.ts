/** Version of the engine; part of every fingerprint, so a record names the arithmetic that made it. */
export const ENGINE_VERSION = '0.1.0';
