/**
 * The seams between the parts of app/: which folder may import which, read
 * from the import statements of every source file (the TypeScript compiler's
 * own pre-processor finds static, type-only and dynamic imports alike).
 */
// @ts-nocheck

import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const app = join(root, 'app');

function sources(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const path = join(folder, entry.name);
    if (entry.isDirectory()) return sources(path);
    return /\.(ts|svelte)$/.test(entry.name) && !entry.name.endsWith('.d.ts') ? [path] : [];
  });
}

/** What a file imports: relative imports resolved to repository paths (extension dropped), package names as written. */
function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  const code = file.endsWith('.svelte') ? [...text.matchAll(/<script[^>]*>([\s\S]*?)<\/script>/g)].map((m) => m[1]).join('\n') : text;
  const { importedFiles } = ts.preProcessFile(code, true, true);
  return importedFiles.map(({ fileName }) =>
    fileName.startsWith('.') ? relative(root, resolve(dirname(file), fileName)).replace(/\.(ts|js|svelte)$/, '') : fileName,
  );
}

const files = sources(app);
const graph = new Map(files.map((file) => [relative(root, file).replace(/\.(ts|svelte)$/, ''), importsOf(file)]));

function importersOf(from: string, target: (path: string) => boolean): string[] {
  return [...graph].filter(([file]) => file.startsWith(from)).flatMap(([file, imports]) => imports.filter(target).map((path) => `${file} -> ${path}`));
}

describe('the seams of app/', () => {
  it('reads a graph of the whole app (the check below would pass on an empty one)', () => {
    expect(graph.size).toBeGreaterThan(150);
    expect(graph.get('app/renderer/lib/api/client')).toContain('app/shared/contract');
  });

  it('the page and the store import nothing from the service: the contract is shared', () => {
    const intoService = (path: string) => path.startsWith('app/service/') || path === 'app/service';
    expect(importersOf('app/renderer/', intoService)).toEqual([]);
    expect(importersOf('app/store/', intoService)).toEqual([]);
    expect(importersOf('app/shared/', intoService)).toEqual([]);
  });

  it('the browser-mode server imports nothing from the command line, and neither shell takes first start from the other', () => {
    expect(importersOf('app/server/', (path) => path.startsWith('app/cli/'))).toEqual([]);
    expect(importersOf('app/main/', (path) => path.startsWith('app/server/'))).toEqual([]);
  });

  it('the running server never loads the build tool', () => {
    const buildTool = (path: string) => path === 'vite' || path.startsWith('vite/') || path.startsWith('@sveltejs/') || path.includes('vite.config');
    expect(importersOf('app/server/', buildTool)).toEqual([]);
    expect(importersOf('app/cli/', buildTool)).toEqual([]);
  });

  it('no import circle inside app/, type-only imports included', () => {
    const circles: string[] = [];
    const state = new Map<string, 'open' | 'done'>();
    const visit = (file: string, path: string[]): void => {
      if (state.get(file) === 'done') return;
      if (state.get(file) === 'open') {
        circles.push([...path.slice(path.indexOf(file)), file].join(' > '));
        return;
      }
      state.set(file, 'open');
      // A Svelte component that imports itself draws a tree recursively; that is not a circle between modules.
      for (const next of graph.get(file) ?? []) if (graph.has(next) && next !== file) visit(next, [...path, file]);
      state.set(file, 'done');
    };
    for (const file of graph.keys()) visit(file, []);
    expect(circles).toEqual([]);
  });
});
