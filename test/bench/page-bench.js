// What a benchmark of the built page needs: a Chromium to drive and the page
// built in out/renderer. Without either it says which, and what is not
// measured, and the benchmark ends there (exit 0: measuring is not testing).
import { existsSync } from 'node:fs';
import { join } from 'node:path';

/** The Chromium to drive (CHROMIUM_PATH, else Debian's); ends the process, saying why, when it or the built page is missing. */
export function pageBenchChromium(root, measured) {
  const chromium = [process.env.CHROMIUM_PATH, '/usr/bin/chromium', '/usr/bin/chromium-browser'].find((p) => p && existsSync(p));
  if (!chromium) {
    console.log(`No Chromium (set CHROMIUM_PATH or install Debian's chromium): ${measured} not measured.`);
    process.exit(0);
  }
  if (!existsSync(join(root, 'out/renderer/index.html'))) {
    console.log(`The page is not built (npm run build:renderer): ${measured} not measured.`);
    process.exit(0);
  }
  return chromium;
}

/** The address a server started as `child` prints (its first line starting "http"); rejects if it ends first. */
export function printedAddress(child) {
  return new Promise((resolve, reject) => {
    let text = '';
    child.stdout.on('data', (chunk) => {
      text += chunk;
      const line = text.split('\n').find((l) => l.startsWith('http'));
      if (line) resolve(line.trim());
    });
    child.once('exit', (code) => reject(new Error(`the server ended (exit ${code}) before printing its address`)));
  });
}
