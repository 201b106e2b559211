import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

let cached: string | undefined;

/** The package root: the nearest folder above this module holding warmcast's package.json. */
export function packageRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (;;) {
    const candidate = join(dir, 'package.json');
    if (existsSync(candidate) && JSON.parse(readFileSync(candidate, 'utf8')).name === 'warmcast') return dir;
    const up = dirname(dir);
    if (up === dir) throw new Error('warmcast package.json not found above ' + fileURLToPath(import.meta.url));
    dir = up;
  }
}

/** warmcast's version from package.json. */
export function packageVersion(): string {
  cached ??= JSON.parse(readFileSync(join(packageRoot(), 'package.json'), 'utf8')).version as string;
  return cached;
}
