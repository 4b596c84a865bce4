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
    /** The faintest text: 4.7:1 on the darkest light ground (dangerSoft); it was #7C8692, 2.9–3.6:1. */
    inkFaint: '#5B6570',
    /** Lines that only separate (table rows, panels): decoration, so no contrast minimum applies. */
    rule: '#D9D3C5',
    /**
     * The edge of a control a person must find (text boxes, chips, check boxes, the off switch):
     * 3.6:1 on paper and 4.0:1 on panel, over WCAG 2.x's 3:1 for user-interface components (1.4.11).
     * It used to be `rule`, 1.47:1 on panel.
     */
    control: '#857D6E',
    accent: '#2E6B5E',
    accentInk: '#FFFFFF',
    accentSoft: '#DCEBE6',
    danger: '#A8432E',
    dangerSoft: '#F6E1DA',
    /**
     * Errors and other "nothing was judged" states: amber ink (5.9:1 on panel, 5.0:1 on its soft ground)
     * and its soft ground. A point in error is drawn and labelled in it too (pictures, diagnosis chips).
     */
    warn: '#875A08',
    warnSoft: '#F5EAD0',
    /** The grounds of the suite status labels (draft, submitted, retired) and the ink of "submitted". */
    draftSoft: '#ECE7DC',
    submittedInk: '#7A5310',
    submittedSoft: '#F5E7C8',
    retiredSoft: '#E9E6E0',
    /** The ground a received HTML mail is shown on: white, as mail clients show the mail it was written for. */
    mailGround: '#FFFFFF',
    /** The ground of a secret shown once (a new API token). */
    secretSoft: '#FBF3E2',
    focus: '#C58B1B',
    nav: '#1F2A36',
    navInk: '#E9E4D8',
    navActive: '#F4F1EA',
    /** The active navigation item's ground and the navigation's own rule lines, on `nav`. */
    navActiveGround: '#34414F',
    navRule: '#3A4756',
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
