import { StyleSheet, View } from 'react-native';
import { theme } from '../../../constants/theme';
import { SkText } from '../../ui/sk-text';
import type { FieldRules } from './field-rules';
import { PointListEditor } from './point-list-editor';
import { RuleLines } from '../../ui/rule-lines';
import { SmallButton } from '../../ui/small-button';
import type { CutDraft } from './suite-draft';
import { ToggleChip } from '../../ui/toggle-chip';

/**
 * The cut layout of a regular branch: polylines from branch points to other branch points or
 * to infinity. The layout's own rule (an uncut branch point, a cut-free loop whose monodromy
 * is not 1) is shown above the cuts, naming the point or the loop.
 */
export function CutLayoutEditor({
  cuts,
  onChange,
  rules,
}: {
  cuts: CutDraft[];
  onChange: (cuts: CutDraft[]) => void;
  rules: FieldRules;
}) {
  const set = (i: number, cut: CutDraft) => onChange(cuts.map((c, j) => (j === i ? cut : c)));
  return (
    <View style={styles.box}>
      <SkText variant="label">Cut layout</SkText>
      <SkText variant="caption" style={styles.lead}>
        Each cut is a polyline; its last segment can continue to infinity. Every branch point must lie on a cut, and a
        loop that crosses no cut must come back to the same value.
      </SkText>
      <RuleLines rules={rules('branch.cuts').map((r) => `Cut layout: ${r}`)} testID="cut-layout-rules" />
      {cuts.length === 0 ? (
        <SkText variant="caption" tone="inkFaint">
          No cuts yet.
        </SkText>
      ) : null}
      {cuts.map((cut, i) => (
        <View key={i} style={styles.cut} accessibilityLabel={`Cut ${i + 1}`}>
          <View style={styles.cutHead}>
            <SkText variant="label">Cut {i + 1}</SkText>
            <SmallButton
              label="Remove cut"
              accessibilityLabel={`Remove cut ${i + 1}`}
              onPress={() => onChange(cuts.filter((_, j) => j !== i))}
              danger
            />
          </View>
          <RuleLines
            rules={rules(`branch.cuts.${i}`)
              .concat(rules(`branch.cuts.${i}.points`))
              .map((r) => `Cut ${i + 1} ${r}`)}
          />
          <PointListEditor
            label={`Cut ${i + 1} point`}
            points={cut.points}
            onChange={(points) => set(i, { ...cut, points })}
            rules={rules}
            field={`branch.cuts.${i}.points`}
          />
          <ToggleChip
            label={`Cut ${i + 1} continues to infinity`}
            value={cut.toInfinity}
            onChange={(toInfinity) => set(i, { ...cut, toInfinity })}
          />
        </View>
      ))}
      <SmallButton
        label="+ Add a cut"
        onPress={() =>
          onChange([
            ...cuts,
            {
              points: [
                { re: '0', im: '0' },
                { re: '-1', im: '0' },
              ],
              toInfinity: true,
            },
          ])
        }
      />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(2) },
  lead: { lineHeight: 20 },
  cut: { gap: theme.space(2), borderLeftWidth: 3, borderLeftColor: theme.color.danger, paddingLeft: theme.space(3) },
  cutHead: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between' },
});
