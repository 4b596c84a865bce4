// The end-to-end files share one database, seeded once with the demo's "morning after" state: the
// nightly plan's latest completed run with its regressions. Journeys that start and finish plan runs
// (maintainer-day, runs-and-overview, day-run-page…) change that state, so the journeys that read it
// run first; the rest follow in path order. Jest's own order (slowest and failed first, from its
// cache) differed between runs: day-overview passed when it ran early and failed when it ran after
// maintainer-day, whose finished nightly run has no regressions against the seeded one.
const Sequencer = require('@jest/test-sequencer').default;
const path = require('node:path');

/** Files that read the seeded state, in the order they run. */
const SEEDED_STATE_FIRST = ['day-overview.test.ts', 'day-formula-speech.test.ts'];

class SeededStateFirstSequencer extends Sequencer {
  sort(tests) {
    const rank = (test) => {
      const i = SEEDED_STATE_FIRST.indexOf(path.basename(test.path));
      return i === -1 ? SEEDED_STATE_FIRST.length : i;
    };
    return [...tests].sort((a, b) => rank(a) - rank(b) || a.path.localeCompare(b.path));
  }
}

module.exports = SeededStateFirstSequencer;
