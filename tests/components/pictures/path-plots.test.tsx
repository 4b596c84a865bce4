import { render, screen } from '@testing-library/react';
import { PathPlots } from '../../../components/pictures/path-plots';
import { theme } from '../../../constants/theme';
import type { FailurePathPoint, FailurePathView } from '../../../shared/failure-path-view';

/**
 * A circle of 17 points (t = k/16) where the reference's argument jumps from +π/2 to −π/2
 * between t = 8/16 and 9/16, while the library jumps early, between 4/16 and 5/16, and stays
 * there: points 5–8 fail on the wrong side, and at 9/16 the library has no jump left to make.
 */
function misplacedJump(): FailurePathView {
  const points: FailurePathPoint[] = Array.from({ length: 17 }, (_, k) => {
    const t = k / 16;
    const expectedArg = k <= 8 ? 1.2 + k * 0.04 : -1.9 + (k - 9) * 0.04;
    const wrong = k >= 5 && k <= 8;
    return {
      index: k,
      t,
      z: { re: Math.cos(2 * Math.PI * t), im: Math.sin(2 * Math.PI * t) },
      outcome: wrong ? 'fail' : 'pass',
      diagnosis: wrong ? 'misplaced-cut' : null,
      ulps: wrong ? 3e15 : null,
      expectedArg,
      actualArg: wrong ? expectedArg - Math.PI : expectedArg,
      actualFrom: wrong ? 'stored' : 'expected-within-tolerance',
      failureId: wrong ? String(100 + k) : null,
    };
  });
  return {
    failureId: '106',
    focusIndex: 6,
    suite: { slug: 's', version: 1, subject: 'sqrt(z)', branch: 'principal', convention: 'signed-zero' },
    target: 'lib@1',
    path: { name: 'unit circle', kind: 'circle', points: 17 },
    axis: 't',
    tolerance: { ulps: 4, relative: null },
    points,
    cuts: [],
    cutsNote: null,
    branchPoints: [],
    jumps: { expected: [0.53125], library: [0.28125] },
    counts: { pass: 13, fail: 4, error: 0, skipped: 0, notApplicable: 0 },
    note: '',
    reference: { cached: 12, computed: 0 },
  };
}

/** The x of a value of t in the plot, read from the drawn axis: the first and last tick labels sit at t = 0 and t = 1. */
function xOfT(svg: Element, t: number): number {
  const ticks = Array.from(svg.querySelectorAll('text')).filter(
    (el) => el.textContent === '0' || el.textContent === '1',
  );
  const at0 = Number(
    ticks.find((el) => el.textContent === '0' && el.getAttribute('text-anchor') === 'middle')!.getAttribute('x'),
  );
  const at1 = Number(
    ticks.find((el) => el.textContent === '1' && el.getAttribute('text-anchor') === 'middle')!.getAttribute('x'),
  );
  return at0 + t * (at1 - at0);
}

describe('PathPlots', () => {
  it('names a jump at the wrong place in words, between the right values of t', () => {
    render(<PathPlots view={misplacedJump()} />);
    expect(screen.getByTestId('jump-words').textContent).toBe(
      "The reference's argument jumps between t = 0.5 and 0.563; the library's jumps between t = 0.25 and 0.313. The library jumps where the reference does not: between t = 0.25 and 0.313. The library does not jump where the reference does: between t = 0.5 and 0.563.",
    );
    expect(
      screen.getByText("The run's own jump check: the reference jumps at t ≈ 0.531; the library jumps at t ≈ 0.281."),
    ).toBeTruthy();
  });

  it("says in words that the reference does not jump when the run's jump check found no jump of its own", () => {
    const view = misplacedJump();
    view.jumps = { expected: [], library: [0.28125, 0.75] };
    render(<PathPlots view={view} />);
    expect(
      screen.getByText(
        "The run's own jump check: the reference does not jump; the library jumps at t ≈ 0.281 and 0.75.",
      ),
    ).toBeTruthy();
    expect(screen.queryByText(/no t/)).toBeNull();
  });

  it('writes its ticks and titles in the app font, not the browser default serif', () => {
    render(<PathPlots view={misplacedJump()} />);
    const texts = Array.from(document.querySelectorAll<SVGTextElement>('svg text'));
    expect(texts.length).toBeGreaterThan(10);
    for (const t of texts) expect(t.style.fontFamily).toBe(theme.font.regular);
  });

  it("draws the library's extra jump at its t and the reference's at its own", () => {
    render(<PathPlots view={misplacedJump()} />);
    const arg = screen.getByRole('img', {
      name: /^Argument of the expected and the library's value along the path unit circle, up from minus pi to pi, across t along the path/,
    });
    const svg = arg.querySelector('svg')!;
    const label = (text: string) => Array.from(svg.querySelectorAll('text')).find((el) => el.textContent === text)!;
    expect(Number(label('library jump ≠').getAttribute('x'))).toBeCloseTo(xOfT(svg, 0.28125), 6);
    expect(Number(label('reference jump').getAttribute('x'))).toBeCloseTo(xOfT(svg, 0.53125), 6);
    expect(Number(label('this case').getAttribute('x'))).toBeCloseTo(xOfT(svg, 6 / 16) + 4, 6);
  });

  it('says every jump is where the reference has one when the library follows it', () => {
    const view = misplacedJump();
    view.points = view.points.map((p) => ({
      ...p,
      outcome: 'pass',
      diagnosis: null,
      ulps: null,
      actualArg: p.expectedArg,
      actualFrom: 'expected-within-tolerance',
    }));
    render(<PathPlots view={view} />);
    expect(screen.getByTestId('jump-words').textContent).toMatch(/Every jump is where the reference has one\.$/);
    expect(screen.queryByText('library jump ≠')).toBeNull();
  });

  it('plots failing points above the tolerance line on the ulps scale and names the worst and the axes in its label, numbers said in words', () => {
    render(<PathPlots view={misplacedJump()} />);
    const ulps = screen.getByRole('img', {
      name:
        'Error in ulps along the path unit circle: 4 points over the tolerance, the worst 3.0 times 10 to the power 15 ulps.' +
        ' Up: ulps on a log scale from 0 to 1 times 10 to the power 16; across: t along the path (0 equals start, 1 equals end).',
    });
    const svg = ulps.querySelector('svg')!;
    expect(Array.from(svg.querySelectorAll('text')).some((el) => el.textContent === 'tolerance 4 ulps')).toBe(true);
    expect(screen.getByText('ulps (log scale)')).toBeTruthy();
  });

  it('compares a straddle point by point instead of calling its crossings jumps', () => {
    const view = misplacedJump();
    view.axis = 'index';
    view.path = { name: 'straddle cut 1', kind: 'straddle', points: 17 };
    render(<PathPlots view={view} />);
    expect(screen.getByTestId('jump-words').textContent).toBe(
      "These points are not a continuous path (a straddle goes back and forth across the cut), so the argument is compared point by point: the library's value has another argument at 4 points (5, 6, 7, 8).",
    );
    expect(screen.queryByText('reference jump')).toBeNull();
    expect(screen.getAllByText('point number along the path')).toHaveLength(2);
  });

  it('says a list of points has nothing between its points, so no jumps are looked for on it', () => {
    const view = misplacedJump();
    view.axis = 'index';
    view.path = { name: 'both zeros at -4', kind: 'points', points: 17 };
    render(<PathPlots view={view} />);
    expect(screen.getByTestId('jump-words').textContent).toBe(
      "These points are not a continuous path (a list of points has nothing between them), so the argument is compared point by point: the library's value has another argument at 4 points (5, 6, 7, 8).",
    );
    expect(screen.queryByText('reference jump')).toBeNull();
  });
});
