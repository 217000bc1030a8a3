import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

// Everything the scripts create at run time lives here (git-ignored).
export const workDir = path.join(repoRoot, '.railyard');

export function fromRoot(...segments) {
  return path.join(repoRoot, ...segments);
}
