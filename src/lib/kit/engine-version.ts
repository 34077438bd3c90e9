/**
 * Version of the pattern, layout and render engine, printed on every sheet and hashed into every kit so a
 * changed engine never serves a stale cached kit. Bump it whenever output for the same input changes;
 * tests/lib/kit/engine-output.test.ts fails when the demo kits' files change without a bump.
 */
export const ENGINE_VERSION = '0.4.1';
