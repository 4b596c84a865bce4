import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { CheckBoxMark } from '../ui/check-box-mark';
import { DisclosureToggle } from '../ui/disclosure-toggle';
import { spaceToggles } from '../ui/space-toggles';
import { SkText } from '../ui/sk-text';

export interface ColumnOption<T extends string> {
  id: T;
  title: string;
  /** Always shown: the chooser lists it as on and cannot turn it off. */
  fixed?: boolean;
}

/** Which columns a table shows: a button that opens a list of checkboxes. */
export function ColumnChooser<T extends string>({
  options,
  shown,
  onChange,
}: {
  options: ColumnOption<T>[];
  shown: T[];
  onChange: (next: T[]) => void;
}) {
  const [open, setOpen] = useState(false);
  return (
    <View style={styles.root}>
      <DisclosureToggle
        open={open}
        onToggle={() => setOpen(!open)}
        accessibilityLabel="Choose columns"
        style={styles.toggle}
      >
        <SkText variant="smallLabel" tone="ink">
          Columns ({shown.length} of {options.length})
        </SkText>
      </DisclosureToggle>
      {open ? (
        <View style={styles.list} accessibilityLabel="Columns">
          {options.map((o) => {
            const on = o.fixed || shown.includes(o.id);
            return (
              <Pressable
                key={o.id}
                accessibilityRole="checkbox"
                accessibilityLabel={`Show column ${o.title}`}
                aria-checked={on}
                aria-disabled={o.fixed ? true : undefined}
                disabled={o.fixed}
                onPress={() => onChange(on ? shown.filter((s) => s !== o.id) : [...shown, o.id])}
                {...(o.fixed
                  ? {}
                  : spaceToggles(() => onChange(on ? shown.filter((s) => s !== o.id) : [...shown, o.id])))}
                style={styles.item}
              >
                <CheckBoxMark on={on} />
                <SkText variant="caption" tone="ink">
                  {o.title}
                  {o.fixed ? ' (always)' : ''}
                </SkText>
              </Pressable>
            );
          })}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: theme.space(2) },
  toggle: { alignSelf: 'flex-start' },
  list: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    gap: theme.space(1),
    padding: theme.space(2),
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
    backgroundColor: theme.color.panel,
  },
  item: {
    minHeight: 44,
    flexDirection: 'row',
    alignItems: 'center',
    gap: theme.space(2),
    paddingHorizontal: theme.space(2),
    minWidth: 150,
  },
});
