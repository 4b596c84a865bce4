import { GLYPHS } from '../../constants/glyphs';
import { theme } from '../../constants/theme';
import type { SuiteStatus } from '../../shared/suite-status';
import { TagPill } from '../ui/tag-pill';

/** Each status has a word and a glyph of its own, so the label reads without its colour. */
const SUITE_STATUS_LOOK: Record<SuiteStatus, { word: string; glyph: string; color: string; background: string }> = {
  draft: { word: 'draft', glyph: GLYPHS.notYet.glyph, color: theme.color.inkSoft, background: theme.color.draftSoft },
  submitted: {
    word: 'submitted',
    glyph: GLYPHS.submitted.glyph,
    color: theme.color.submittedInk,
    background: theme.color.submittedSoft,
  },
  approved: {
    word: 'approved',
    glyph: GLYPHS.passed.glyph,
    color: theme.color.accent,
    background: theme.color.accentSoft,
  },
  'changes-requested': {
    word: 'changes requested',
    glyph: GLYPHS.sentBack.glyph,
    color: theme.color.danger,
    background: theme.color.dangerSoft,
  },
  retired: {
    word: 'retired',
    glyph: GLYPHS.notInUse.glyph,
    color: theme.color.inkFaint,
    background: theme.color.retiredSoft,
  },
};

export function SuiteStatusLabel({ status, version }: { status: SuiteStatus; version?: number }) {
  const look = SUITE_STATUS_LOOK[status];
  const text = `${look.glyph} ${version !== undefined ? `v${version} ` : ''}${look.word}`;
  return (
    <TagPill
      text={text}
      ink={look.color}
      soft={look.background}
      accessibilityLabel={`${version !== undefined ? `version ${version} ` : ''}${look.word}`}
    />
  );
}
