import type { DiagnosisKind } from '../shared/diagnosis';
import { MARKS_FAMILY } from './marks-family';

/**
 * On the web, ✓ comes from our own check mark (client/install-marks-font.ts declares it for
 * U+2713 only) and everything else from IBM Plex, whose ✓ looks like √. Elsewhere (native, and
 * node, where the end-to-end helpers read the breakpoints) the plain family.
 */
const withMarks = (family: string): string => (typeof document === 'undefined' ? family : `${MARKS_FAMILY}, ${family}`);

/**
 * Sheetkeeper's look: warm paper, slate ink, one verdigris accent. Meaning is never
 * carried by colour alone: every coloured state also has a word or a glyph.
 */
export const theme = {
  color: {
    paper: '#F4F1EA',
    panel: '#FFFDF8',
    ink: '#1F2A36',
    inkSoft: '#4D5A68',
    inkFaint: '#7C8692',
    rule: '#D9D3C5',
    accent: '#2E6B5E',
    accentInk: '#FFFFFF',
    accentSoft: '#DCEBE6',
    danger: '#A8432E',
    dangerSoft: '#F6E1DA',
    /** Errors and other "nothing was judged" states: amber ink (5.9:1 on panel, 5.0:1 on its soft ground) and its soft ground. */
    warn: '#875A08',
    warnSoft: '#F5EAD0',
    focus: '#C58B1B',
    nav: '#1F2A36',
    navInk: '#E9E4D8',
    navActive: '#F4F1EA',
  },
  /**
   * One ink per diagnosis kind, for its chip's word and for its marks in the findings-by-kind
   * picture: 5.8–8.1:1 against `color.panel` and 5.2–7.3:1 against `color.paper` (marks need 3:1, a chip's
   * word 4.5:1; tests/constants/theme-kind-contrast.test.ts holds them to 4.5:1).
   */
  kindInk: {
    'other-sheet': '#A8432E',
    'cut-side': '#8A5A00',
    'zero-sign': '#6A4C93',
    'misplaced-cut': '#9C2F5E',
    'not-finite': '#5B6B2E',
    disagreement: '#7B3F00',
    unexplained: '#4D5A68',
    inaccurate: '#2F5F8A',
  } satisfies Record<DiagnosisKind, string>,
  font: {
    regular: withMarks('IBMPlexSans_400Regular'),
    medium: withMarks('IBMPlexSans_500Medium'),
    bold: withMarks('IBMPlexSans_700Bold'),
    mono: withMarks('IBMPlexMono_400Regular'),
  },
  size: { small: 13, body: 16, large: 20, title: 26 },
  space: (n: number) => n * 4,
  radius: 6,
  /** Touch targets are at least this tall (WCAG 2.5.5 asks for 44 px). */
  touch: 48,
  /** From this width on, side navigation and multi-column layouts. */
  wide: 1024,
} as const;
