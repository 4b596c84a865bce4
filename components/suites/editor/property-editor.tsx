import { StyleSheet, View } from 'react-native';
import { theme } from '../../../constants/theme';
import { PROPERTY_LAWS } from '../../../shared/schemas/property-check-schema';
import { ChipGroup } from '../../ui/chip-group';
import { ComplexInput } from './complex-input';
import { EditorItem } from './editor-item';
import { complexRules } from './complex-rules';
import type { ItemEditorProps } from './item-editor-props';
import { FormTextInput } from '../../ui/form-text-input';
import { RuleLines } from '../../ui/rule-lines';
import type { PropertyDraft } from './suite-draft';

/** One property check: a law, the region its random points come from, runs and a pinned seed. */
export function PropertyEditor({ value, index, onChange, onRemove, rules }: ItemEditorProps<PropertyDraft>) {
  const f = `properties.${index}`;
  const n = `Property ${index + 1}`;
  const set = (patch: Partial<PropertyDraft>) => onChange({ ...value, ...patch });
  return (
    <EditorItem
      title={n}
      removeText="Remove check"
      removeLabel={`Remove property ${index + 1}`}
      onRemove={onRemove}
      rules={rules(f)}
    >
      <ChipGroup
        label={`${n} law`}
        options={PROPERTY_LAWS.map((law) => ({ value: law, text: law }))}
        value={value.law}
        onChange={(law) => set({ law })}
      />
      <RuleLines rules={rules(`${f}.law`)} />
      <ChipGroup
        label={`${n} region`}
        options={[
          { value: 'near-cuts', text: 'near the cuts' },
          { value: 'disc', text: 'a disc' },
          { value: 'box', text: 'a box' },
        ]}
        value={value.region}
        onChange={(region) => set({ region })}
      />
      <View style={styles.row}>
        {value.region === 'disc' ? (
          <>
            <ComplexInput
              label={`${n} disc center`}
              value={value.center}
              onChange={(center) => set({ center })}
              rules={complexRules(rules, `${f}.region.center`)}
            />
            <FormTextInput
              label={`${n} disc radius`}
              visibleLabel="Radius"
              value={value.radius}
              onChangeText={(radius) => set({ radius })}
              rules={rules(`${f}.region.radius`)}
              mono
            />
          </>
        ) : null}
        {value.region === 'box' ? (
          <>
            <ComplexInput
              label={`${n} box corner min`}
              value={value.min}
              onChange={(min) => set({ min })}
              rules={complexRules(rules, `${f}.region.min`)}
            />
            <ComplexInput
              label={`${n} box corner max`}
              value={value.max}
              onChange={(max) => set({ max })}
              rules={complexRules(rules, `${f}.region.max`)}
            />
          </>
        ) : null}
        {value.region === 'near-cuts' ? (
          <FormTextInput
            label={`${n} distance from the cuts`}
            visibleLabel="Within distance"
            value={value.distance}
            onChangeText={(distance) => set({ distance })}
            rules={rules(`${f}.region.distance`)}
            mono
          />
        ) : null}
      </View>
      <View style={styles.row}>
        {value.law === 'root-power' ? (
          <FormTextInput
            label={`${n} power`}
            visibleLabel="Power n"
            value={value.power}
            onChangeText={(power) => set({ power })}
            rules={rules(`${f}.power`)}
            mono
          />
        ) : null}
        <FormTextInput
          label={`${n} runs`}
          visibleLabel="Runs"
          value={value.runs}
          onChangeText={(runs) => set({ runs })}
          rules={rules(`${f}.runs`)}
          mono
        />
        <FormTextInput
          label={`${n} seed`}
          visibleLabel="Seed"
          value={value.seed}
          onChangeText={(seed) => set({ seed })}
          rules={rules(`${f}.seed`)}
          mono
        />
      </View>
    </EditorItem>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(3) },
});
