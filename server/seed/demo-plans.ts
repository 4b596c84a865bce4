/** The demo team's plans and schedules (invented): which suites run against which targets, and when. */
export interface DemoPlan {
  name: string;
  description: string;
  recipients: string[];
  /** Suite ids, or a test on them. */
  suites: (id: string) => boolean;
  /** Target names, chosen among the installed ones. */
  targets: (names: string[]) => string[];
  schedule: { cron: string; timeZone: string };
}

const newest = (prefix: string, count: number) => (names: string[]) =>
  names
    .filter((n) => n.startsWith(prefix))
    .sort((a, b) => a.localeCompare(b, 'en', { numeric: true }))
    .slice(-count);

export const DEMO_PLANS: DemoPlan[] = [
  {
    name: 'complex.js nightly',
    description:
      'Every signed-zero suite and every regular branch against the two newest complex.js releases, so a change between them shows as a version change.',
    recipients: ['kwame@sheetkeeper.test', 'hanne@sheetkeeper.test'],
    suites: (id) => id.endsWith('-sz') || !id.includes('-principal-'),
    targets: newest('complex.js@', 2),
    schedule: { cron: '30 2 * * *', timeZone: 'Europe/Oslo' },
  },
  {
    name: 'mathjs before release',
    description:
      'The counter-clockwise suites against the current and the previous mathjs major through the Complex entry point.',
    recipients: ['kwame@sheetkeeper.test'],
    suites: (id) => id.endsWith('-ccw'),
    targets: (names) => names.filter((n) => /^mathjs@1[45]\.[\d.]+\/complex$/.test(n)),
    schedule: { cron: '0 4 * * 1-5', timeZone: 'UTC' },
  },
  {
    name: 'Python binding cross-check',
    description:
      "Python's cmath is the team's Annex G yardstick: if it fails a suite, the suite is suspect before the library is.",
    recipients: ['hanne@sheetkeeper.test'],
    suites: (id) => id.endsWith('-sz'),
    targets: newest('cmath@', 1),
    schedule: { cron: '15 3 * * 0', timeZone: 'Europe/Oslo' },
  },
];
