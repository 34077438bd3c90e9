/**
 * A Vite plugin for the vitest run only (vitest.config.ts): every API route module, as a test imports it, also
 * exports `ROUTE_INPUT_SCHEMAS_EXPORT` — the zod schemas the route checks its input with, whether imported or
 * defined in the file — so the fuzz suite (fuzz.test.ts) derives its cases from each route's own schema, and a
 * route another helper adds is covered the moment its file exists, with no list to update. A schema is found as
 * the first argument of `parseInput(…)` or as the receiver of `….parse(` / `….safeParse(`.
 */
import type { Plugin } from 'vite';

/** The name of the extra export. */
export const ROUTE_INPUT_SCHEMAS_EXPORT = '__routeInputSchemas';

const ROUTE_FILE = /\/src\/pages\/api\/.+\.ts$/;
const SCHEMA_USES = [/\bparseInput\(\s*([A-Za-z_$][\w$]*)\s*,/g, /\b([A-Za-z_$][\w$]*Schema)\.(?:safeParse|parse)\(/g];

/** The schema names a route file's source checks input with, each once, in order of first use. */
export function routeInputSchemaNames(source: string): string[] {
  return [...new Set(SCHEMA_USES.flatMap((re) => [...source.matchAll(re)].map((m) => m[1]!)))];
}

export function routeInputSchemasPlugin(): Plugin {
  return {
    name: 'kitwright:route-input-schemas',
    enforce: 'pre',
    transform(code, id) {
      if (!ROUTE_FILE.test(id.split('?')[0]!)) return null;
      const names = routeInputSchemaNames(code);
      return `${code}\nexport const ${ROUTE_INPUT_SCHEMAS_EXPORT} = { ${names.join(', ')} };\n`;
    },
  };
}
