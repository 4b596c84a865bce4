import { StyleSheet, Text, View } from 'react-native';
import { useUploadReferenceTable } from '../client/use-upload-reference-table';
import { theme } from '../constants/theme';
import { FileUploadButton } from './file-upload-button';
import { IssueList } from './issue-list';
import { formatComplexText } from '../shared/format-complex-text';

/**
 * A CSV of reference values computed elsewhere (z, expected value, source), checked against
 * Sheetkeeper's reference for the suite's latest version; every disagreement is listed.
 */
export function ReferenceTableUpload({ slug }: { slug: string }) {
  const upload = useUploadReferenceTable(slug);
  const check = upload.data?.check;
  return (
    <View style={styles.box}>
      <Text style={styles.lead}>
        Columns z_re, z_im, expected_re, expected_im, source. Values agree within 1 ulp per part with matching zero
        signs.
      </Text>
      <FileUploadButton
        label="Upload a reference CSV"
        types={['text/csv', '.csv']}
        busy={upload.isPending}
        onFile={(file) => upload.mutate(file)}
      />
      <IssueList error={upload.error} prefix="file." />
      {check ? (
        <View style={styles.result} testID="reference-check">
          <Text style={styles.summary}>
            {check.disagreements.length === 0 && check.invalid.length === 0 ? '✓' : '≠'} v{upload.data?.version}:{' '}
            {check.rows} rows read, {check.agree} agree, {check.disagreements.length} disagree
            {check.invalid.length ? `, ${check.invalid.length} unreadable` : ''}.
          </Text>
          {check.disagreements.map((d) => (
            <View key={d.line} style={styles.row}>
              <Text style={styles.rowHead}>
                ≠ line {d.line} · z = {formatComplexText(d.z)} ·{' '}
                {d.ulps === Infinity || d.ulps > 1e15 ? 'far apart' : `${d.ulps} ulps`}
              </Text>
              <Text style={styles.mono}>
                theirs ({d.source || 'no source'}): {formatComplexText(d.theirs)}
              </Text>
              <Text style={styles.mono}>ours: {formatComplexText(d.ours)}</Text>
            </View>
          ))}
          {check.invalid.map((i) => (
            <Text key={`x${i.line}`} style={styles.invalid}>
              × line {i.line}: {i.reason}
            </Text>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(2) },
  lead: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkSoft, lineHeight: 20 },
  result: { gap: theme.space(2) },
  summary: { fontFamily: theme.font.medium, fontSize: theme.size.body, color: theme.color.ink },
  row: { borderLeftWidth: 3, borderLeftColor: theme.color.danger, paddingLeft: theme.space(2), gap: 2 },
  rowHead: { fontFamily: theme.font.medium, fontSize: theme.size.small, color: theme.color.danger },
  mono: { fontFamily: theme.font.mono, fontSize: 13, color: theme.color.ink },
  invalid: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.danger },
});
