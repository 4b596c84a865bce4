import type { SuiteVersionView } from '../../shared/suite-version-view';

/**
 * Who answers for a version's words, as the version history and the review screen say it. The
 * author is the last editor, so when someone edited another person's draft both names show.
 */
export function authorshipText(v: Pick<SuiteVersionView, 'author' | 'takenOverFrom'>): string {
  return v.takenOverFrom
    ? `written by ${v.author.displayName}, who took over ${v.takenOverFrom.displayName}'s draft`
    : `written by ${v.author.displayName}`;
}
