import { StyleSheet, View } from 'react-native';
import { GLYPHS } from '../../../constants/glyphs';
import { theme } from '../../../constants/theme';
import { ChipGroup } from '../../ui/chip-group';
import { SkText } from '../../ui/sk-text';
import { ComplexInput } from './complex-input';
import { EditorItem } from './editor-item';
import { complexRules } from './complex-rules';
import type { FieldRules } from './field-rules';
import { FormTextInput } from '../../ui/form-text-input';
import { PointListEditor } from './point-list-editor';
import { RuleLines } from '../../ui/rule-lines';
import type { PathDraft } from './suite-draft';

const KINDS = [
  { value: 'circle', text: 'circle' },
  { value: 'segment', text: 'segment' },
  { value: 'polyline', text: 'polyline' },
  { value: 'straddle', text: 'straddle' },
  { value: 'points', text: 'points' },
] as const;

/** One path of the suite form; the fields follow the kind, and every rule sits under its field. */
export function PathEditor({
  path,
  index,
  onChange,
  onRemove,
  rules,
}: {
  path: PathDraft;
  index: number;
  onChange: (p: PathDraft) => void;
  onRemove: () => void;
  rules: FieldRules;
}) {
  const f = `paths.${index}`;
  const n = `Path ${index + 1}`;
  const set = (patch: Partial<PathDraft>) => onChange({ ...path, ...patch });
  return (
    <EditorItem
      title={n}
      removeText="Remove path"
      removeLabel={`Remove path ${index + 1}`}
      onRemove={onRemove}
      rules={rules(f)}
    >
      <FormTextInput
        label={`${n} name`}
        visibleLabel="Name"
        value={path.name}
        onChangeText={(name) => set({ name })}
        rules={rules(`${f}.name`)}
      />
      {path.kind === 'grid' ? (
        <SkText variant="caption">A grid from a suite file: kept as it came; the form does not edit grids.</SkText>
      ) : (
        <ChipGroup label={`${n} kind`} options={KINDS} value={path.kind} onChange={(kind) => set({ kind })} />
      )}
      {path.kind === 'circle' ? (
        <>
          <View style={styles.row}>
            <ComplexInput
              label={`${n} center`}
              value={path.center}
              onChange={(center) => set({ center })}
              rules={complexRules(rules, `${f}.center`)}
            />
            <FormTextInput
              label={`${n} radius`}
              visibleLabel="Radius"
              value={path.radius}
              onChangeText={(radius) => set({ radius })}
              rules={rules(`${f}.radius`)}
              mono
            />
          </View>
          <View style={styles.row}>
            <FormTextInput
              label={`${n} start angle`}
              visibleLabel="Start angle"
              hint='radians, or "3pi/4"'
              value={path.startAngle}
              onChangeText={(startAngle) => set({ startAngle })}
              rules={rules(`${f}.start_angle`)}
              mono
            />
            <FormTextInput
              label={`${n} turns`}
              visibleLabel="Turns"
              value={path.turns}
              onChangeText={(turns) => set({ turns })}
              rules={rules(`${f}.turns`)}
              mono
            />
          </View>
          <ChipGroup
            label={`${n} direction`}
            options={[
              { value: 'ccw', text: 'counter-clockwise', glyph: GLYPHS.counterClockwise.glyph },
              { value: 'cw', text: 'clockwise' },
            ]}
            value={path.direction}
            onChange={(direction) => set({ direction })}
          />
        </>
      ) : null}
      {path.kind === 'segment' ? (
        <View style={styles.row}>
          <ComplexInput
            label={`${n} from`}
            value={path.from}
            onChange={(from) => set({ from })}
            rules={complexRules(rules, `${f}.from`)}
          />
          <ComplexInput
            label={`${n} to`}
            value={path.to}
            onChange={(to) => set({ to })}
            rules={complexRules(rules, `${f}.to`)}
          />
        </View>
      ) : null}
      {path.kind === 'points' ? (
        <SkText variant="caption">
          Exactly these points, each evaluated once in this order. A list is not a path: jumps and monodromy are not
          checked on it.
        </SkText>
      ) : null}
      {path.kind === 'polyline' || path.kind === 'points' ? (
        <>
          <RuleLines rules={rules(`${f}.points`).map((r) => `${n} points ${r}`)} />
          <PointListEditor
            label={`${n} point`}
            points={path.points}
            onChange={(points) => set({ points })}
            rules={rules}
            field={`${f}.points`}
          />
        </>
      ) : null}
      {path.kind === 'straddle' ? (
        <>
          <ChipGroup
            label={`${n} straddles`}
            options={[
              { value: 'ray', text: 'a ray' },
              { value: 'segment', text: 'a segment' },
            ]}
            value={path.cutKind}
            onChange={(cutKind) => set({ cutKind })}
          />
          <View style={styles.row}>
            <ComplexInput
              label={`${n} cut from`}
              value={path.cutFrom}
              onChange={(cutFrom) => set({ cutFrom })}
              rules={complexRules(rules, `${f}.cut.from`)}
            />
            <ComplexInput
              label={path.cutKind === 'ray' ? `${n} cut through` : `${n} cut to`}
              value={path.cutTo}
              onChange={(cutTo) => set({ cutTo })}
              rules={complexRules(rules, path.cutKind === 'ray' ? `${f}.cut.through` : `${f}.cut.to`)}
            />
          </View>
          <RuleLines rules={rules(`${f}.cut`).map((r) => `${n} cut ${r}`)} />
          <FormTextInput
            label={`${n} along`}
            visibleLabel="Along the cut"
            hint={
              path.cutKind === 'ray'
                ? 'distances from its start, separated by commas'
                : 'fractions of its length in [0, 1], separated by commas'
            }
            value={path.along}
            onChangeText={(along) => set({ along })}
            rules={rules(`${f}.along`, 'within')}
            mono
          />
          <FormTextInput
            label={`${n} offsets`}
            visibleLabel="Offsets from the cut"
            hint="blank for 1e-3, 1e-9, 1e-300, 5e-324; each used on both sides, plus ±0 on the cut"
            value={path.offsets}
            onChangeText={(offsets) => set({ offsets })}
            rules={rules(`${f}.offsets`, 'within')}
            mono
          />
        </>
      ) : null}
      {path.kind === 'circle' || path.kind === 'segment' || path.kind === 'polyline' ? (
        <>
          <ChipGroup
            label={`${n} sampling`}
            options={[
              { value: 'samples', text: 'evenly spaced' },
              { value: 'at', text: 'at given t' },
            ]}
            value={path.sampling}
            onChange={(sampling) => set({ sampling })}
          />
          {path.sampling === 'samples' ? (
            <FormTextInput
              label={`${n} samples`}
              visibleLabel="Samples"
              hint="points at t = i/(samples − 1)"
              value={path.samples}
              onChangeText={(samples) => set({ samples })}
              rules={rules(`${f}.samples`)}
              mono
            />
          ) : (
            <FormTextInput
              label={`${n} at`}
              visibleLabel="At t"
              hint="values of t in [0, 1], separated by commas"
              value={path.at}
              onChangeText={(at) => set({ at })}
              rules={rules(`${f}.at`, 'within').concat(rules(`${f}.samples`))}
              mono
            />
          )}
        </>
      ) : null}
    </EditorItem>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(3) },
});
