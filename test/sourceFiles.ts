/** Source files under a folder, recursively, for the tests that check the code itself. */
import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

/** Every file under `dir` whose name matches `name` (TypeScript sources by default), as `dir`-joined paths. */
export function sourceFiles(dir: string, name = /\.(ts|tsx)$/u): string[] {
  return readdirSync(dir).flatMap((entry) => {
    const path = join(dir, entry);
    return statSync(path).isDirectory() ? sourceFiles(path, name) : name.test(entry) ? [path] : [];
  });
}
