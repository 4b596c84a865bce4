import { Pressable, StyleSheet } from 'react-native';
import { theme } from '../../constants/theme';
import { SkText } from './sk-text';

/** A way back up from a detail screen ("← Libraries"), a full 44 px target. */
export function CrumbLink({ label, onPress }: { label: string; onPress: () => void }) {
  return (
    <Pressable
      accessibilityRole="link"
      accessibilityLabel={`Back to ${label}`}
      onPress={onPress}
      style={({ pressed }) => [styles.link, pressed && styles.pressed]}
    >
      <SkText variant="smallLabel" tone="accent">
        ← {label}
      </SkText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  link: { minHeight: 44, justifyContent: 'center', alignSelf: 'flex-start', paddingRight: theme.space(3) },
  pressed: { opacity: 0.7 },
});
