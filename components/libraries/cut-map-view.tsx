import { useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, useWindowDimensions, View } from 'react-native';
import { ApiRequestError } from '../../client/api-request-error';
import { useCutMap, type CutMapAsk } from '../../client/use-cut-map';
import { useFingerprint } from '../../client/use-fingerprint';
import { theme } from '../../constants/theme';
import { fieldIssues } from '../../shared/field-issues';
import { cutMapQuery } from '../../shared/schemas/cut-map-query';
import { ActionButton } from '../ui/action-button';
import { SkText } from '../ui/sk-text';
import { ComputedNote } from './computed-note';
import { CutMapPicture } from '../pictures/cut-map-picture';
import { QueryState } from '../ui/query-state';
import { TextField } from '../ui/text-field';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';
import { CHOICE_CHIP_STYLE } from '../ui/choice-chip-style';
import { RadioMark } from '../ui/radio-mark';
import { useRadioKeys } from '../ui/use-radio-keys';

const DEFAULT_BOX = '-4,-4,4,4';
const DEFAULT_GRID = '81x81';

type Errors = Partial<Record<'fn' | 'box' | 'grid', string>>;

/** The broken rules by field, from the shared schema here or from the server's answer ("query.box" → box). */
function errorsOf(issues: { field: string; rule: string }[]): Errors {
  const out: Errors = {};
  for (const { field, rule } of issues) {
    const key = field.replace(/^query\.?/, '') || 'box';
    if (key === 'fn' || key === 'box' || key === 'grid') out[key] ??= rule;
  }
  return out;
}

/**
 * One function's cut map on one target, with the box and grid to sample: checked with the same
 * schema as the server before anything is sent, the server's own rules shown beside the fields,
 * and nothing typed lost when a request fails. The other functions of the target (from its
 * fingerprint, when known) are one tap away.
 */
export function CutMapView({ name, fn, onChooseFn }: { name: string; fn: string; onChooseFn: (fn: string) => void }) {
  const wide = useWindowDimensions().width >= theme.wide;
  const [box, setBox] = useState(DEFAULT_BOX);
  const [grid, setGrid] = useState(DEFAULT_GRID);
  const [ask, setAsk] = useState<Omit<CutMapAsk, 'fn'>>({ box: DEFAULT_BOX, grid: DEFAULT_GRID });
  const [local, setLocal] = useState<Errors>({});
  const map = useCutMap(name, { fn, ...ask });
  const fingerprint = useFingerprint(name);
  const functions = fingerprint.data ? [...new Set(fingerprint.data.fingerprint.cuts.map((c) => c.function))] : [fn];
  const fnRadio = useRadioKeys(functions.length, functions.indexOf(fn), (index) => {
    const next = functions[index];
    if (next !== undefined && next !== fn) onChooseFn(next);
  });

  const serverErrors =
    map.error instanceof ApiRequestError && map.error.body.kind === 'invalid-input'
      ? errorsOf(map.error.body.issues)
      : {};
  const errors: Errors = { ...serverErrors, ...local };
  const submit = () => {
    const checked = cutMapQuery.safeParse({ fn, box, grid });
    if (!checked.success) {
      setLocal(
        errorsOf(
          fieldIssues(checked.error).map((i) => ({ field: i.field === '(body)' ? 'box' : i.field, rule: i.rule })),
        ),
      );
      return;
    }
    setLocal({});
    setAsk({ box, grid });
  };

  const form = (
    <View style={styles.form}>
      <SkText variant="smallLabel" style={styles.formHead}>
        Function
      </SkText>
      <View style={styles.chips} accessibilityRole="radiogroup" accessibilityLabel="Function to map">
        {functions.map((f, index) => (
          <Pressable
            key={f}
            {...fnRadio(index)}
            accessibilityRole="radio"
            accessibilityLabel={`Map ${f}`}
            aria-checked={f === fn}
            style={[styles.chip, f === fn && styles.chipOn]}
          >
            <RadioMark on={f === fn} inverse={f === fn} />
            <SkText variant="mono" style={f === fn && styles.chipTextOn}>
              {f}
            </SkText>
          </Pressable>
        ))}
      </View>
      {errors.fn ? (
        <SkText variant="caption" tone="danger" accessibilityRole="alert">
          × Function {errors.fn}
        </SkText>
      ) : null}
      <TextField
        label="Box (re0,im0,re1,im1)"
        value={box}
        onChangeText={(t) => {
          setBox(t);
          setLocal((e) => ({ ...e, box: undefined }));
        }}
        error={errors.box}
        autoCapitalize="none"
      />
      <TextField
        label="Grid (columns x rows, up to 201x201)"
        value={grid}
        onChangeText={(t) => {
          setGrid(t);
          setLocal((e) => ({ ...e, grid: undefined }));
        }}
        error={errors.grid}
        autoCapitalize="none"
      />
      <ActionButton label="Map this box" busy={map.isFetching} onPress={submit} />
    </View>
  );

  let result;
  if (map.isPending) result = <QueryState state="loading" />;
  else if (map.isError && !map.data) {
    result =
      serverErrors.fn || serverErrors.box || serverErrors.grid ? (
        <QueryState state="error" message="The server refused this request: see the fields." />
      ) : (
        <QueryState state="error" message={map.error.message} onRetry={() => void map.refetch()} />
      );
  } else if (map.data) {
    result = (
      <View style={styles.result}>
        {map.isPlaceholderData ? (
          <View style={styles.busy} accessibilityLiveRegion="polite">
            <ActivityIndicator color={theme.color.accent} />
            <SkText variant="caption">Mapping the new request… the picture below is still the previous one.</SkText>
          </View>
        ) : (
          <ComputedNote answer={map.data} />
        )}
        <SkText variant="heading">
          {map.data.cutMap.function} on {map.data.cutMap.target}, {map.data.cutMap.columns}×{map.data.cutMap.rows} grid
        </SkText>
        <CutMapPicture cutMap={map.data.cutMap} />
      </View>
    );
  }

  return wide ? (
    <View style={styles.columns}>
      <View style={styles.main}>{result}</View>
      <View style={styles.side}>{form}</View>
    </View>
  ) : (
    <View style={styles.stack}>
      {result}
      {form}
    </View>
  );
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', gap: theme.space(6), alignItems: 'flex-start' },
  main: { flex: 2, minWidth: 0 },
  side: { flex: 1, minWidth: 280 },
  stack: { gap: theme.space(5) },
  form: {
    gap: theme.space(3),
    ...PANEL_BOX_STYLE,
  },
  formHead: { letterSpacing: 0.3 },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
  chip: CHOICE_CHIP_STYLE,
  chipOn: { backgroundColor: theme.color.accent, borderColor: theme.color.accent },
  chipTextOn: { color: theme.color.accentInk },
  result: { gap: theme.space(3) },
  busy: { flexDirection: 'row', alignItems: 'center', gap: theme.space(2) },
});
