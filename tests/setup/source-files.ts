import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';

const ROOT = path.join(__dirname, '..', '..');

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? filesUnder(full) : /\.tsx?$/.test(name) ? [full] : [];
  });
}

/**
 * The TypeScript files under the project's `dirs` (e.g. app, components, client), each with its
 * path from the project root and its code without comments: a block comment keeps its line breaks,
 * so a line number read from `code` is the file's own; a `//` after a colon or a quote is a URL or
 * a string, not a comment. For the tests that hold what the screens may write (glyphs, characters
 * the fonts have, colours).
 */
export function sourceFiles(dirs: string[]): { file: string; code: string }[] {
  return dirs
    .flatMap((dir) => filesUnder(path.join(ROOT, dir)))
    .map((full) => ({
      file: path.relative(ROOT, full),
      code: readFileSync(full, 'utf8')
        .replace(/\/\*[\s\S]*?\*\//g, (comment) => comment.replace(/[^\n]/g, ''))
        .replace(/(^|[^:'"`])\/\/.*$/gm, '$1'),
    }));
}
