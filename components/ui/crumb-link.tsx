import { Pressable, StyleSheet, Text } from 'react-native';
import { theme } from '../../constants/theme';

/** A way back up from a detail screen ("← Libraries"), a full 44 px target. */
export function CrumbLink({ label, onPress }: { label: string; onPress: () => void }) {
  return (
    <Pressable
      accessibilityRole="link"
      accessibilityLabel={`Back to ${label}`}
      onPress={onPress}
      style={({ pressed }) => [styles.link, pressed && styles.pressed]}
    >
      <Text style={styles.text}>← {label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  link: { minHeight: 44, justifyContent: 'center', alignSelf: 'flex-start', paddingRight: theme.space(3) },
  pressed: { opacity: 0.7 },
  text: { fontFamily: theme.font.medium, fontSize: theme.size.small, color: theme.color.accent },
});
