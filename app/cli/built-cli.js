// The ES module face of built-cli.cjs (the build and browser mode import it
// from here); the launcher requires the CommonJS file itself.
import { createRequire } from 'node:module';

const built = createRequire(import.meta.url)('./built-cli.cjs');

export const { CLI_OUT, MANIFEST, writeWhole, freshManifest, codeCacheFile, loadBuiltCli } = built;
