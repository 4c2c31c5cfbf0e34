import { getDocumentAsync } from 'expo-document-picker';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Notice } from '../ui/notice';
import { formatFileSize } from './import-words';
import type { UploadFile } from './upload-request';

type FilePickStepProps = { file: UploadFile | null; onFile: (file: UploadFile) => void; disabled?: boolean };

const TYPES = ['text/csv', 'text/tab-separated-values', 'text/plain', '*/*'];

/** Choose the bay file: what is expected, and the button that opens the device's file chooser. */
export function FilePickStep({ file, onFile, disabled = false }: FilePickStepProps) {
  const [problem, setProblem] = useState<string | null>(null);
  const pick = async () => {
    setProblem(null);
    try {
      const result = await getDocumentAsync({ type: TYPES, multiple: false, copyToCacheDirectory: false });
      if (result.canceled) return;
      const asset = result.assets[0];
      // On the web the asset carries the browser's File; the upload needs it.
      if (!asset?.file) {
        setProblem('This device did not hand over the file. Try again, or import from a computer.');
        return;
      }
      onFile(asset.file);
    } catch {
      setProblem('The file could not be opened. Try again.');
    }
  };
  return (
    <Card>
      {file ? (
        <View style={styles.chosen}>
          <View style={styles.name}>
            <AppText variant="bodyStrong" numberOfLines={1}>
              {file.name}
            </AppText>
            <AppText variant="caption" tone="muted">
              {formatFileSize(file.size)}
            </AppText>
          </View>
          <Button title="Choose another file" variant="secondary" compact onPress={() => void pick()} disabled={disabled} />
        </View>
      ) : (
        <>
          <AppText>
            The shots of a session as exported from the bay: a CSV or tab-separated text file, one shot per row, with a header row
            naming the columns. Ovalyard reads the columns, units and left/right notation, and shows every guess before anything is
            stored.
          </AppText>
          <Button title="Choose a bay file" onPress={() => void pick()} disabled={disabled} />
        </>
      )}
      {problem ? <Notice tone="danger">{problem}</Notice> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  chosen: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' },
  name: { flex: 1, minWidth: 160, gap: 2 },
});
