import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';

const ROOT = path.join(__dirname, '..', '..');

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? sourceFiles(full) : /\.tsx?$/.test(name) ? [full] : [];
  });
}

/** A CSS colour written out: #rgb, #rgba, #rrggbb or #rrggbbaa, or rgb()/hsl() with numbers. */
const RAW_COLOUR = /#[0-9a-fA-F]{3,4}\b|#[0-9a-fA-F]{6}\b|#[0-9a-fA-F]{8}\b|\b(?:rgba?|hsla?)\(\s*\d/;

describe('colours', () => {
  it('come only from constants/theme.ts: no screen, component or client file writes one out (comments aside; line numbers kept)', () => {
    const found: string[] = [];
    for (const dir of ['app', 'components', 'client']) {
      for (const file of sourceFiles(path.join(ROOT, dir))) {
        const code = readFileSync(file, 'utf8')
          .replace(/\/\*[\s\S]*?\*\//g, (comment) => comment.replace(/[^\n]/g, ''))
          .replace(/(^|[^:])\/\/.*$/gm, '$1');
        code.split('\n').forEach((line, i) => {
          if (RAW_COLOUR.test(line)) found.push(`${path.relative(ROOT, file)}:${i + 1}: ${line.trim()}`);
        });
      }
    }
    expect(found).toEqual([]);
  });
});
