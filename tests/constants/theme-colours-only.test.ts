import { sourceFiles } from '../setup/source-files';

/** A CSS colour written out: #rgb, #rgba, #rrggbb or #rrggbbaa, or rgb()/hsl() with numbers. */
const RAW_COLOUR = /#[0-9a-fA-F]{3,4}\b|#[0-9a-fA-F]{6}\b|#[0-9a-fA-F]{8}\b|\b(?:rgba?|hsla?)\(\s*\d/;

describe('colours', () => {
  it('come only from constants/theme.ts: no screen, component or client file writes one out (comments aside; line numbers kept)', () => {
    const found: string[] = [];
    for (const { file, code } of sourceFiles(['app', 'components', 'client']))
      code.split('\n').forEach((line, i) => {
        if (RAW_COLOUR.test(line)) found.push(`${file}:${i + 1}: ${line.trim()}`);
      });
    expect(found).toEqual([]);
  });
});
