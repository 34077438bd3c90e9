/**
 * Version of the pattern, layout and render engine, printed on every sheet and hashed into every kit so a
 * changed engine never serves a stale cached kit. Bump it whenever output for the same input changes.
 */
export const ENGINE_VERSION = '0.4.0';
