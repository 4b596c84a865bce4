import { router } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { useUploadSuite } from '../../client/use-upload-suite';
import { theme } from '../../constants/theme';
import { FileUploadButton } from '../ui/file-upload-button';
import { IssueList } from './issue-list';

/** "Upload a suite file": a JSON suite becomes a draft (or updates yours); refused files list each field and rule. */
export function SuiteFileUpload() {
  const upload = useUploadSuite();
  return (
    <View style={styles.box}>
      <FileUploadButton
        label="Upload a suite file"
        types={['application/json', '.json']}
        busy={upload.isPending}
        onFile={(file) => upload.mutate(file, { onSuccess: (version) => router.push(`/suites/${version.slug}`) })}
      />
      <IssueList error={upload.error} prefix="file." testID="suite-upload-issues" />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(2) },
});
