/**
 * Build of the renderer (Vue 3 + Pinia + three.js): root renderer/, output dist/renderer/.
 * base './' so the same build loads from file://, the desktop app protocol and the web host.
 * No remote content; the build contains no eval and no inline scripts (CSP: script-src 'self').
 *
 * The project-file validator (main/common/project) compiles its JSON Schema with ajv at run time,
 * which uses `new Function` and is blocked by our CSP. For the renderer bundle the plugin below
 * replaces that one module by ajv's standalone (precompiled) code for the same schema and the
 * same ajv options, so the page validates with identical messages and no eval.
 * Keep AJV_OPTIONS and the keywords in step with main/common/project/validation/schema-validator.ts.
 *
 * Workers (renderer/tuning/tuning-worker.ts, `new Worker(new URL(...), { type: 'module' })`) are
 * bundled as ES modules into the same folder, so they load under `worker-src 'self'`.
 */
import { defineConfig, type Plugin } from 'vite';
import vue from '@vitejs/plugin-vue';
import { fileURLToPath } from 'node:url';
import { readFileSync } from 'node:fs';
import Ajv from 'ajv';
import standaloneCode from 'ajv/dist/standalone/index.js';

const here = (p: string): string => fileURLToPath(new URL(p, import.meta.url));

const SCHEMA_VALIDATOR = 'main/common/project/validation/schema-validator.ts';
const SCHEMA_FILE = here('./main/common/project/stayset-project.v1.schema.json');
const STANDALONE_ID = '\0stayset-project-schema-standalone';

function precompiledSchemaValidator(): Plugin {
  return {
    name: 'stayset-precompiled-schema-validator',
    enforce: 'pre',
    resolveId(id) {
      return id === STANDALONE_ID ? id : null;
    },
    load(id) {
      if (id === STANDALONE_ID) {
        const schema = JSON.parse(readFileSync(SCHEMA_FILE, 'utf8')) as object;
        const ajv = new Ajv({ allErrors: true, verbose: true, strictNumbers: true, discriminator: true, code: { source: true, esm: true } });
        ajv.addKeyword({ keyword: 'x-message', schemaType: ['string', 'object'] });
        ajv.addKeyword({ keyword: 'x-field-up', schemaType: 'number' });
        let code = standaloneCode(ajv, ajv.compile(schema));
        // Standalone code still `require`s ajv's small runtime helpers: turn them into imports.
        const imports: string[] = [];
        code = code.replace(/require\("([^"]+)"\)/g, (_m, spec: string) => {
          const name = `__ajvRuntime${imports.length}`;
          imports.push(`import * as ${name} from ${JSON.stringify(spec)};`);
          return name;
        });
        return `${imports.join('\n')}\n${code.replace(/^"use strict";/, '')}`;
      }
      if (id.replace(/\\/g, '/').endsWith(SCHEMA_VALIDATOR)) {
        return [
          `import validate from ${JSON.stringify(STANDALONE_ID)};`,
          `import schema from '../stayset-project.v1.schema.json';`,
          `import { ajvErrorsText } from './ajv-error-text.ts';`,
          'export const projectSchema = schema;',
          'export function schemaErrors(data) {',
          '  if (validate(data)) return [];',
          '  return ajvErrorsText(data, validate.errors ?? []);',
          '}',
        ].join('\n');
      }
      return null;
    },
  };
}

export default defineConfig({
  root: here('./renderer'),
  base: './',
  plugins: [precompiledSchemaValidator(), vue()],
  build: {
    outDir: here('./dist/renderer'),
    emptyOutDir: true,
    target: 'es2022',
    chunkSizeWarningLimit: 2500,
    modulePreload: { polyfill: false },
  },
  worker: { format: 'es', plugins: () => [precompiledSchemaValidator()] },
  server: { port: 5173, strictPort: false },
});
