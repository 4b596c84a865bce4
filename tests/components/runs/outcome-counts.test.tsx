import { render, screen } from '@testing-library/react';
import { OutcomeCounts } from '../../../components/runs/outcome-counts';

const counts = { pass: 6774, fail: 1073, error: 0, skipped: 788, notApplicable: 12 };

describe('OutcomeCounts', () => {
  it('counts failures by class, branch findings first, and points not applicable beside the skipped ones', () => {
    render(<OutcomeCounts counts={counts} byClass={{ branch: 257, accuracy: 816 }} />);
    const texts = screen.getAllByText(/\d/).map((e) => e.textContent);
    expect(texts).toEqual([
      '❌ 257 branch findings',
      '≈ 816 accuracy findings',
      '✓ 6,774 passed',
      '− 788 skipped',
      '– 12 not applicable',
    ]);
    expect(screen.getByLabelText(/^257 branch findings, 816 accuracy findings, 6,774 passed/)).toBeTruthy();
  });

  it('says "failed" for counts without classes, and shows every count with `all`', () => {
    render(<OutcomeCounts counts={{ ...counts, notApplicable: 0 }} all />);
    expect(screen.getAllByText(/\d/).map((e) => e.textContent)).toEqual([
      '❌ 1,073 failed',
      '✓ 6,774 passed',
      '◊ 0 in error',
      '− 788 skipped',
      '– 0 not applicable',
    ]);
  });
});
