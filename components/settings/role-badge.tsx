import { theme } from '../../constants/theme';
import type { Role } from '../../shared/roles';
import { TagPill } from '../ui/tag-pill';

/** Each role has its own glyph, so the badge reads without its colour. */
const GLYPH: Record<Role, string> = { admin: '◊', maintainer: '∆', reviewer: '•', contributor: '+' };

export function RoleBadge({ role }: { role: Role }) {
  return (
    <TagPill
      text={`${GLYPH[role]} ${role}`}
      ink={theme.color.accent}
      soft={theme.color.accentSoft}
      accessibilityLabel={`role ${role}`}
    />
  );
}
