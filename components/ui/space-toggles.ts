/**
 * Props for a `checkbox` Pressable: Space toggles it, as a native check box does (WAI-ARIA
 * Authoring Practices, "Checkbox"). react-native-web presses only a `button` on Space, and Enter
 * already presses every Pressable. Spread them: React Native's types do not name `onKeyDown`, which
 * react-native-web hands to the element.
 */
export function spaceToggles(toggle: () => void) {
  return {
    onKeyDown: (event: { key: string; preventDefault(): void }) => {
      if (event.key !== ' ' && event.key !== 'Spacebar') return;
      event.preventDefault();
      toggle();
    },
  };
}
