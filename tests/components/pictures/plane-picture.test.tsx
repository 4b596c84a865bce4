import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { PlanePicture } from '../../../components/pictures/plane-picture';
import type { PlanePoint } from '../../../components/pictures/plane-picture';
import { theme } from '../../../constants/theme';

/**
 * jsdom lays nothing out: the picture learns its width from react-native-web's onLayout, which
 * reads offsetWidth when a ResizeObserver reports. Both are stood in for, at 600 × 340.
 */
beforeAll(() => {
  Object.defineProperty(HTMLElement.prototype, 'offsetWidth', { configurable: true, get: () => 600 });
  Object.defineProperty(HTMLElement.prototype, 'offsetHeight', { configurable: true, get: () => 340 });
  (window as unknown as { ResizeObserver: unknown }).ResizeObserver = class {
    constructor(private readonly report: (entries: { target: Element }[]) => void) {}
    observe(target: Element) {
      queueMicrotask(() => this.report([{ target }]));
    }
    unobserve() {}
    disconnect() {}
  };
});

const SQRT_CUT = {
  points: [
    { re: 0, im: 0 },
    { re: -1, im: 0 },
  ],
  toInfinity: true,
};
const straddle: PlanePoint[] = [1e-3, 1e-9, 1e-300, 5e-324, 0, -5e-324, -1e-300, -1e-9, -1e-3].map((im) => ({
  re: -0.5,
  im,
}));
const circle = (radius: number): PlanePoint[] =>
  Array.from({ length: 65 }, (_, k) => ({
    re: radius * Math.cos((2 * Math.PI * k) / 64),
    im: radius * Math.sin((2 * Math.PI * k) / 64),
  }));

/** The plane's own drawing (the legend's swatches are SVGs too), once the picture knows its width. */
async function drawn(ui: React.ReactElement): Promise<SVGElement> {
  const view = render(ui);
  return waitFor(() => {
    const svg = view.container.querySelector<SVGElement>('svg[width="600"]');
    if (!svg) throw new Error('the picture is not drawn yet');
    return svg;
  });
}

/** The straddle at −0.5 beside the square root's cut and branch point, one point marked as the case. */
const drawnStraddle = () =>
  drawn(
    <PlanePicture
      label="A straddle."
      pointSets={[{ name: 'straddle cut 1', points: straddle }]}
      cuts={[SQRT_CUT]}
      branchPoints={[{ re: 0, im: 0 }]}
      marks={[{ at: straddle[1]!, tone: 'focus' }]}
      height={340}
      testID="plane"
    />,
  );

describe('PlanePicture', () => {
  it('shows a straddle on the square root cut at −0.5 on a log scale from the cut, with the branch point 0 drawn inside', async () => {
    const svg = await drawnStraddle();
    expect(screen.getByTestId('plane-scale').textContent).toMatch(
      /^distance from −0\.5 on the cut, log scale \(rings at [^)]*1e−300[^)]*\); directions from it are true$/,
    );
    expect(svg.textContent).toContain('distance from the cut, log scale');
    // The branch point's ring (r = 6) lies inside the 600 × 340 picture.
    const ring = Array.from(svg.querySelectorAll('circle')).find((c) => c.getAttribute('r') === '6')!;
    expect(Number(ring.getAttribute('cx'))).toBeGreaterThan(0);
    expect(Number(ring.getAttribute('cx'))).toBeLessThan(600);
    // Nine points at nine heights, not one dot.
    const dots = Array.from(svg.querySelectorAll('circle')).filter((c) => c.getAttribute('r') === '2.5');
    expect(new Set(dots.map((c) => c.getAttribute('cy'))).size).toBe(9);
    expect(screen.getByText('points of the path “straddle cut 1”')).toBeTruthy();
  });

  it('says its scale and its ring labels in words to a screen reader: "1e−300" is "1 times 10 to the power minus 300"', async () => {
    const svg = await drawnStraddle();
    const name = screen.getByRole('img').getAttribute('aria-label')!;
    expect(name).toMatch(
      /^A straddle\. Scale: distance from minus 0\.5 on the cut, log scale \(rings at [^)]*1 times 10 to the power minus 300[^)]*\); directions from it are true; zoom 1 times\. Press plus or minus to zoom, 0 to reset\.$/,
    );
    expect(name).not.toMatch(/1e|−/);
    const ring = Array.from(svg.querySelectorAll('text')).find((t) => t.textContent === '1e−300')!;
    expect(ring.getAttribute('aria-label')).toBe('1 times 10 to the power minus 300');
  });

  it.each([1e-3, 1e-310])('draws a circle of radius %p as a circle across the picture', async (radius) => {
    const svg = await drawn(
      <PlanePicture
        label="A small circle."
        paths={[{ name: 'around 0', points: circle(radius) }]}
        cuts={[SQRT_CUT]}
        branchPoints={[{ re: 0, im: 0 }]}
        height={340}
        testID="plane"
      />,
    );
    const line = Array.from(svg.querySelectorAll('polyline')).find((p) => p.getAttribute('stroke-width') === '1.5')!;
    const xs = line
      .getAttribute('points')!
      .split(' ')
      .map((pair) => Number(pair.split(',')[0]));
    expect(xs.every(Number.isFinite)).toBe(true);
    expect(Math.max(...xs) - Math.min(...xs)).toBeGreaterThan(200);
  });

  it('zooms in, out and back with its buttons and with +, − and 0, and says the scale', async () => {
    await drawn(
      <PlanePicture
        label="A circle."
        paths={[{ name: 'unit circle', points: circle(1) }]}
        height={340}
        testID="plane"
      />,
    );
    const scale = () => screen.getByTestId('plane-scale').textContent;
    const zoom = () => screen.getByTestId('plane-zoom').textContent;
    const before = scale();
    expect(zoom()).toBe('zoom 1×');
    fireEvent.click(screen.getByRole('button', { name: 'Zoom in on the picture' }));
    expect(zoom()).toBe('zoom 2×');
    expect(scale()).not.toBe(before);
    const image = screen.getByRole('img');
    fireEvent.keyDown(image, { key: '+' });
    expect(zoom()).toBe('zoom 4×');
    fireEvent.keyDown(image, { key: '-' });
    fireEvent.click(screen.getByRole('button', { name: 'Zoom out of the picture' }));
    fireEvent.click(screen.getByRole('button', { name: 'Zoom out of the picture' }));
    expect(zoom()).toBe('zoom 1/2×');
    fireEvent.keyDown(image, { key: '0' });
    expect(zoom()).toBe('zoom 1×');
    expect(scale()).toBe(before);
  });

  it('writes every word on the picture in the app font', async () => {
    const svg = await drawn(
      <PlanePicture label="A circle." paths={[{ name: 'unit circle', points: circle(1) }]} height={340} />,
    );
    const texts = Array.from(svg.querySelectorAll<SVGTextElement>('text'));
    expect(texts.length).toBeGreaterThan(0);
    for (const t of texts) expect(t.style.fontFamily).toBe(theme.font.regular);
  });
});
