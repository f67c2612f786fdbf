// @ts-nocheck
import { svelte } from '@sveltejs/vite-plugin-svelte';
import { defineConfig } from 'vitest/config';

// One run for everything but the browser tests: the Svelte plugin compiles the
// window's rune classes (`*.svelte.ts`) that `*.test.svelte.ts` files exercise.
export default defineConfig({
  plugins: [svelte()],
  test: {
    include: ['test/**/*.test.ts', 'test/**/*.test.svelte.ts'],
    exclude: ['test/browser/**', 'node_modules/**'],
    benchmark: { include: ['test/bench/**/*.bench.ts'] },
    testTimeout: 60_000,
  },
});
