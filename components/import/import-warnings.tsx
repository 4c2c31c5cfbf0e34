import { StyleSheet, View } from 'react-native';
import type { BayFilePreview } from '../queries/bay-files';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Notice } from '../ui/notice';
import { warningTitle } from './import-words';

type ImportWarningsProps = {
  preview: BayFilePreview;
  /** Off for a re-map: the stored file is, of course, already in the fitting. */
  showDuplicate?: boolean;
};

/** What the fitter should check before importing: a duplicate file, unit doubts, format doubts. */
export function ImportWarnings({ preview, showDuplicate = true }: ImportWarningsProps) {
  const { report, sniff } = preview;
  const duplicateOf = showDuplicate ? preview.duplicateOf : null;
  const unknown = report.unknownClubs;
  // Nothing to check: no empty block (it would still take the page's gap).
  if (!duplicateOf && report.warnings.length === 0 && sniff.doubts.length === 0 && unknown.length === 0) return null;
  return (
    <View style={styles.list}>
      {duplicateOf ? (
        <Notice tone="danger" title="This file is already in the fitting">
          {`It was imported as "${duplicateOf.fileName}". Importing it again is refused; pick another file, or delete that bay file first.`}
        </Notice>
      ) : null}
      {report.warnings.map((w, i) => (
        <Notice key={`${w.code}-${w.column ?? ''}-${i}`} tone="caution" title={warningTitle(w.code)}>
          {w.message}
        </Notice>
      ))}
      {sniff.doubts.map((d) => (
        <Notice key={d} tone="caution" title="Check how the file was read">
          {d}
        </Notice>
      ))}
      {unknown.length ? (
        <Notice tone="caution" title="Clubs not recognised">
          <AppText>{`Kept as written: ${unknown.join(', ')}. Their shots import, but do not sort into the bag.`}</AppText>
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ list: { gap: space.sm } });
