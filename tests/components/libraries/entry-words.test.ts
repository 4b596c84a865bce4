import { entryWords } from '../../../components/libraries/entry-words';
import type { TargetEntry } from '../../../shared/target-entry';

const all = { imaginaryPart: true, realZeroSign: true, imaginaryZeroSign: true };

describe('entryWords', () => {
  it('names each entry with how the value is built, marks the default and says what a plain number cannot carry', () => {
    const entries: TargetEntry[] = [
      {
        name: 'number',
        call: 're as a plain number',
        default: true,
        carries: { ...all, imaginaryPart: false, imaginaryZeroSign: false },
      },
      { name: 'complex', call: 'math.complex(re, im)', default: false, carries: all },
    ];
    expect(entryWords(entries)).toBe(
      'Values go in through: number (re as a plain number, the default; no imaginary part) · complex (math.complex(re, im))',
    );
  });

  it('says nothing for a target recorded before entries', () => {
    expect(entryWords(undefined)).toBeNull();
    expect(entryWords([])).toBeNull();
  });
});
