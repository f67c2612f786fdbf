/**
 * Builds the page with plain Vite (browser mode) into out/renderer; the
 * desktop build (electron.config.ts) reuses the same settings, so both front
 * ends load the very same files.
 */
import { fileURLToPath } from 'node:url';
import { svelte } from '@sveltejs/vite-plugin-svelte';
import { defineConfig, type Plugin, type Rolldown, type UserConfig } from 'vite';
import { CONTENT_SECURITY_POLICY } from '../shared/csp';

const here = fileURLToPath(new URL('.', import.meta.url));

/** Writes the one content security policy (app/shared/csp.ts) into the page's meta tag. */
function contentSecurityPolicy(): Plugin {
  return {
    name: 'loftpoint-content-security-policy',
    transformIndexHtml: (html) => html.replace('__CONTENT_SECURITY_POLICY__', CONTENT_SECURITY_POLICY),
  };
}

/** The module that sends the window's first service calls while the rest of the page loads (browser mode). */
const EARLY_REQUESTS = fileURLToPath(new URL('./lib/api/early-requests.ts', import.meta.url));
/** Where index.html wants the early module's script tag: after the content security policy, before every other script. */
export const EARLY_REQUESTS_MARK = '<!-- early requests -->';

/** The chunk that holds the early module's code (not a facade that only re-exports it). */
function chunkHolding(bundle: Rolldown.OutputBundle, id: string): Rolldown.OutputChunk | undefined {
  return Object.values(bundle).find((output): output is Rolldown.OutputChunk => output.type === 'chunk' && output.modules[id] !== undefined);
}

/**
 * Builds app/renderer/lib/api/early-requests.ts as its own small chunk and loads it first, as an
 * async module script, so the page asks for its first data the moment the HTML arrives; the window's
 * script imports the very same chunk (one module in the page) and takes those answers.
 */
function earlyRequests(): Plugin {
  return {
    name: 'loftpoint-early-requests',
    apply: 'build',
    buildStart() {
      this.emitFile({ type: 'chunk', id: EARLY_REQUESTS, name: 'early-requests' });
    },
    transformIndexHtml: {
      order: 'post',
      handler(html, context) {
        const chunk = chunkHolding(context.bundle ?? {}, EARLY_REQUESTS);
        if (!chunk) throw new Error('the early requests chunk was not built');
        if (!html.includes(EARLY_REQUESTS_MARK)) throw new Error(`index.html has no ${EARLY_REQUESTS_MARK} mark`);
        return html.replace(EARLY_REQUESTS_MARK, `<script type="module" async crossorigin src="./${chunk.fileName}"></script>`);
      },
    },
    // The bundler may put a file in front of the shared chunk that only re-exports it: the page loads the chunk itself.
    generateBundle(_options, bundle) {
      const holder = chunkHolding(bundle, EARLY_REQUESTS);
      for (const [name, output] of Object.entries(bundle)) {
        if (output !== holder && output.type === 'chunk' && output.facadeModuleId === EARLY_REQUESTS) delete bundle[name];
      }
    },
  };
}

/** V8's explicit compile hint: compile every function of this file eagerly, while it streams in. */
const COMPILE_ALL_ON_LOAD = '//# allFunctionsCalledOnLoad';

/**
 * The window's start in one module script: every module the page imports statically from its entry
 * (the window's first view) is bundled into one chunk, instead of a dozen small chunks the bundler
 * would make for the ways the later tabs share them. Each file the page must fetch and instantiate
 * before the first diagram costs the browser a request and a module of its own, on a machine
 * that is busy starting everything at once. The early module stays its own small file.
 */
function windowStart(): { plugin: Plugin; holds: (id: string) => boolean } {
  const startup = new Set<string>();
  const plugin: Plugin = {
    name: 'loftpoint-window-start',
    apply: 'build',
    // Nearly every function of the window's start runs before the first diagram: Chromium compiles them all while
    // the script streams in, on a background thread, instead of one by one on the page's thread as each is first
    // called (V8's explicit compile hint; other engines read a comment).
    generateBundle: {
      order: 'post',
      handler(_options, bundle) {
        for (const output of Object.values(bundle)) {
          if (output.type === 'chunk' && output.isEntry && output.facadeModuleId !== EARLY_REQUESTS) output.code = `${COMPILE_ALL_ON_LOAD}\n${output.code}`;
        }
      },
    },
    buildEnd() {
      startup.clear();
      const entries = [...this.getModuleIds()].filter((id) => this.getModuleInfo(id)?.isEntry && id.endsWith('.html'));
      const queue = [...entries];
      while (queue.length > 0) {
        const id = queue.pop()!;
        if (startup.has(id)) continue;
        startup.add(id);
        for (const next of this.getModuleInfo(id)?.importedIds ?? []) queue.push(next);
      }
    },
  };
  return { plugin, holds: (id) => startup.has(id) && id !== EARLY_REQUESTS };
}

const start = windowStart();

export const rendererRoot = here;
export const rendererOutDir = fileURLToPath(new URL('../../out/renderer', import.meta.url));

export const rendererConfig: UserConfig = {
  root: here,
  // Relative asset paths: the page loads from file:// in the desktop window and from http:// in browser mode.
  base: './',
  plugins: [svelte(), contentSecurityPolicy(), earlyRequests(), start.plugin],
  build: {
    outDir: rendererOutDir,
    emptyOutDir: true,
    target: 'chrome120',
    // Minified in both builds: electron-vite leaves the page unminified unless told, and the desktop
    // build writes the same out/renderer that browser mode serves (twice the bytes to parse at start).
    minify: true,
    sourcemap: false,
    reportCompressedSize: false,
    // The page loads from the local disk or 127.0.0.1, never over a network: one ~0.6 MB bundle is fine.
    chunkSizeWarningLimit: 1024,
    rolldownOptions: {
      output: {
        codeSplitting: {
          groups: [
            { name: 'early-requests', test: (id: string) => id === EARLY_REQUESTS, priority: 2 },
            { name: 'window', test: start.holds, priority: 1 },
          ],
        },
      },
    },
  },
  // Pure core code runs in the page; nothing from Node is bundled.
  resolve: { conditions: ['browser'] },
  clearScreen: false,
  logLevel: 'warn',
};

export default defineConfig(rendererConfig);
