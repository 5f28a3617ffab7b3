import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

function findUp(start: string, accept: (pkg: { name?: string; workspaces?: unknown }) => boolean) {
  let dir = start;
  for (;;) {
    const file = path.join(dir, 'package.json');
    if (existsSync(file) && accept(JSON.parse(readFileSync(file, 'utf8')))) return dir;
    const parent = path.dirname(dir);
    if (parent === dir) throw new Error(`no matching package.json above ${start}`);
    dir = parent;
  }
}

const here = path.dirname(fileURLToPath(import.meta.url));

// Works the same from server/src (vitest) and server/dist (node).
export const serverDir = findUp(here, (p) => p.name === '@holdfast/server');
export const projectDir = findUp(serverDir, (p) => Array.isArray(p.workspaces));

export const serverVersion: string = (
  JSON.parse(readFileSync(path.join(serverDir, 'package.json'), 'utf8')) as { version: string }
).version;
