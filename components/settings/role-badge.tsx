import { theme } from '../../constants/theme';
import type { Role } from '../../shared/roles';
import { TagPill } from '../ui/tag-pill';

export function RoleBadge({ role }: { role: Role }) {
  return (
    <TagPill text={role} ink={theme.color.accent} soft={theme.color.accentSoft} accessibilityLabel={`role ${role}`} />
  );
}
