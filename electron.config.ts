/**
 * `electron-vite build --config electron.config.ts`: the desktop shell's main
 * process (with the browser-mode server as a second entry), the sandboxed
 * preload as CommonJS, and the page with the same settings plain Vite uses.
 */
import { resolve } from 'node:path';
import { defineConfig } from 'electron-vite';
import { rendererConfig, rendererRoot } from './app/renderer/vite.config';

export default defineConfig({
  main: {
    build: {
      outDir: 'out/main',
      rolldownOptions: {
        input: { index: resolve('app/main/index.ts'), server: resolve('app/cli/serve-start.ts') },
        // The native SQLite module is loaded at run time, never bundled; the build tools that
        // browser mode uses to build a missing page from source are not part of a built app.
        external: ['better-sqlite3', 'vite', /^@sveltejs\//, /renderer\/vite\.config$/],
      },
    },
  },
  preload: {
    build: {
      outDir: 'out/preload',
      // A sandboxed preload must be one CommonJS file with nothing to require but electron.
      externalizeDeps: false,
      rolldownOptions: {
        input: { index: resolve('app/preload/index.ts') },
        external: ['electron'],
        output: { format: 'cjs', entryFileNames: '[name].cjs' },
      },
    },
  },
  renderer: {
    ...rendererConfig,
    root: rendererRoot,
    build: {
      ...rendererConfig.build,
      // The same chunks as plain Vite's build (the window's start in one script), from this entry.
      rolldownOptions: { ...rendererConfig.build?.rolldownOptions, input: resolve(rendererRoot, 'index.html') },
    },
  },
});
