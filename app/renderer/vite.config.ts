/**
 * Builds the page with plain Vite (browser mode) into out/renderer; the
 * desktop build (electron.config.ts) reuses the same settings, so both front
 * ends load the very same files.
 */
import { fileURLToPath } from 'node:url';
import { svelte } from '@sveltejs/vite-plugin-svelte';
import { defineConfig, type Plugin, type UserConfig } from 'vite';
import { CONTENT_SECURITY_POLICY } from '../shared/csp';

const here = fileURLToPath(new URL('.', import.meta.url));

/** Writes the one content security policy (app/shared/csp.ts) into the page's meta tag. */
function contentSecurityPolicy(): Plugin {
  return {
    name: 'loftpoint-content-security-policy',
    transformIndexHtml: (html) => html.replace('__CONTENT_SECURITY_POLICY__', CONTENT_SECURITY_POLICY),
  };
}

export const rendererRoot = here;
export const rendererOutDir = fileURLToPath(new URL('../../out/renderer', import.meta.url));

export const rendererConfig: UserConfig = {
  root: here,
  // Relative asset paths: the page loads from file:// in the desktop window and from http:// in browser mode.
  base: './',
  plugins: [svelte(), contentSecurityPolicy()],
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
  },
  // Pure core code runs in the page; nothing from Node is bundled.
  resolve: { conditions: ['browser'] },
  clearScreen: false,
  logLevel: 'warn',
};

export default defineConfig(rendererConfig);
