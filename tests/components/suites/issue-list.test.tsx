import { render, screen } from '@testing-library/react';
import { ApiRequestError } from '../../../client/api-request-error';
import { IssueList } from '../../../components/suites/issue-list';

describe('IssueList', () => {
  it("names each refused field of an uploaded suite in the form's words, counting paths from 1", () => {
    const refused = new ApiRequestError(400, {
      kind: 'invalid-input',
      message: 'invalid',
      issues: [
        { field: 'file.paths.0.radius', rule: 'must be greater than 0: with -1 the circle has no points' },
        { field: 'file.paths.1.samples', rule: 'must be at least 2' },
      ],
    });
    render(<IssueList error={refused} prefix="file." testID="issues" />);
    const text = screen.getByTestId('issues').textContent ?? '';
    expect(text).toContain('Path 1 · radius must be greater than 0: with -1 the circle has no points');
    expect(text).toContain('Path 2 · samples must be at least 2');
    expect(text).not.toMatch(/paths\.\d/);
  });
});
