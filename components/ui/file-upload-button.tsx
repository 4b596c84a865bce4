import * as DocumentPicker from 'expo-document-picker';
import { ActionButton } from './action-button';

interface Props {
  label: string;
  /** MIME types the picker offers, e.g. ["application/json"]. */
  types: string[];
  onFile: (file: File) => void;
  busy?: boolean;
}

/** Opens the system file picker and hands over the chosen file (on the web, the browser's File). */
export function FileUploadButton({ label, types, onFile, busy = false }: Props) {
  const pick = async () => {
    const result = await DocumentPicker.getDocumentAsync({ type: types, multiple: false, copyToCacheDirectory: false });
    const file = result.canceled ? undefined : result.assets[0]?.file;
    if (file) onFile(file);
  };
  return <ActionButton label={label} tone="quiet" busy={busy} onPress={() => void pick()} />;
}
