import { StyleSheet, Text } from 'react-native';
import { theme } from '../constants/theme';
import type { Role } from '../shared/roles';

/** Each role has its own glyph, so the badge reads without its colour. */
const GLYPH: Record<Role, string> = { admin: '◊', maintainer: '∆', reviewer: '•', contributor: '+' };

export function RoleBadge({ role }: { role: Role }) {
  return (
    <Text style={styles.badge} accessibilityLabel={`role ${role}`}>
      {GLYPH[role]} {role}
    </Text>
  );
}

const styles = StyleSheet.create({
  badge: {
    alignSelf: 'flex-start',
    fontFamily: theme.font.medium,
    fontSize: theme.size.small,
    color: theme.color.accent,
    backgroundColor: theme.color.accentSoft,
    paddingHorizontal: theme.space(2),
    paddingVertical: theme.space(1),
    borderRadius: theme.radius,
    overflow: 'hidden',
  },
});
