import { StyleSheet, View } from 'react-native';
import { useUploadReferenceTable } from '../../client/use-upload-reference-table';
import { theme } from '../../constants/theme';
import { FileUploadButton } from '../ui/file-upload-button';
import { SkText } from '../ui/sk-text';
import { IssueList } from './issue-list';
import { formatComplexText } from '../../shared/format-complex-text';

/**
 * A CSV of reference values computed elsewhere (z, expected value, source), checked against
 * Sheetkeeper's reference for the suite's latest version; every disagreement is listed.
 */
export function ReferenceTableUpload({ slug }: { slug: string }) {
  const upload = useUploadReferenceTable(slug);
  const check = upload.data?.check;
  return (
    <View style={styles.box}>
      <SkText variant="caption" style={styles.lead}>
        Columns z_re, z_im, expected_re, expected_im, source. Values agree within 1 ulp per part with matching zero
        signs.
      </SkText>
      <FileUploadButton
        label="Upload a reference CSV"
        types={['text/csv', '.csv']}
        busy={upload.isPending}
        onFile={(file) => upload.mutate(file)}
      />
      <IssueList error={upload.error} prefix="file." />
      {check ? (
        <View style={styles.result} testID="reference-check">
          <SkText variant="label">
            {check.disagreements.length === 0 && check.invalid.length === 0 ? '✓' : '≠'} v{upload.data?.version}:{' '}
            {check.rows} rows read, {check.agree} agree, {check.disagreements.length} disagree
            {check.invalid.length ? `, ${check.invalid.length} unreadable` : ''}.
          </SkText>
          {check.disagreements.map((d) => (
            <View key={d.line} style={styles.row}>
              <SkText variant="smallLabel" tone="danger">
                ≠ line {d.line} · z = {formatComplexText(d.z)} ·{' '}
                {d.ulps === Infinity || d.ulps > 1e15 ? 'far apart' : `${d.ulps} ulps`}
              </SkText>
              <SkText variant="mono">
                theirs ({d.source || 'no source'}): {formatComplexText(d.theirs)}
              </SkText>
              <SkText variant="mono">ours: {formatComplexText(d.ours)}</SkText>
            </View>
          ))}
          {check.invalid.map((i) => (
            <SkText variant="caption" tone="danger" key={`x${i.line}`}>
              × line {i.line}: {i.reason}
            </SkText>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(2) },
  lead: { lineHeight: 20 },
  result: { gap: theme.space(2) },
  row: { borderLeftWidth: 3, borderLeftColor: theme.color.danger, paddingLeft: theme.space(2), gap: 2 },
});
