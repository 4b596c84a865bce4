import type { theme } from './theme';

type Token = keyof typeof theme.color;

/**
 * Which theme colours the app draws on which: every text ink on every ground it may sit on, and
 * the edges of controls on the grounds around them. The light inks are checked against every light
 * ground (the screens mix them freely: a danger word inside an accent note, faint text in a status
 * pill), so a new ground or ink joins its list here and the contrast test covers it.
 * Minimums from WCAG 2.x: 4.5:1 for text (1.4.3, AA, normal size), 3:1 for the parts of a control
 * a person needs to see it (1.4.11).
 */
export const CONTRAST_PAIRS: readonly {
  what: string;
  fronts: readonly Token[];
  grounds: readonly Token[];
  minimum: number;
}[] = [
  {
    what: 'text on the light grounds',
    fronts: ['ink', 'inkSoft', 'inkFaint', 'accent', 'danger', 'warn', 'submittedInk'],
    grounds: [
      'paper',
      'panel',
      'accentSoft',
      'dangerSoft',
      'warnSoft',
      'draftSoft',
      'submittedSoft',
      'retiredSoft',
      'secretSoft',
    ],
    minimum: 4.5,
  },
  {
    what: 'text on the accent (a chosen chip, a primary button)',
    fronts: ['accentInk'],
    grounds: ['accent'],
    minimum: 4.5,
  },
  {
    what: 'text on the navigation',
    fronts: ['navInk', 'navActive'],
    grounds: ['nav', 'navActiveGround'],
    minimum: 4.5,
  },
  { what: 'the edge of a control', fronts: ['control'], grounds: ['paper', 'panel'], minimum: 3 },
];
