import { StyleSheet, View } from 'react-native';

import { DownloadLink } from '@/components/ui/download-link';
import { spacing } from '@/constants/theme';
import { consignmentDocumentPaths } from '@/hooks/queries/consignments';

/** A consignment's three PDFs, made from its data as it stands. */
export function DocumentLinks({ id, reference }: { id: number; reference: string }) {
  const documents = consignmentDocumentPaths(id);
  return (
    <View style={styles.documents}>
      <DownloadLink
        testID="consignment-sheet"
        href={documents.sheet}
        fileName={`${reference} consignment sheet.pdf`}
        label="Consignment sheet (PDF)"
      />
      <DownloadLink
        testID="consignment-condition-report"
        href={documents.conditionReport}
        fileName={`${reference} condition report.pdf`}
        label="Condition report (PDF)"
      />
      <DownloadLink
        testID="consignment-labels"
        href={documents.labels}
        fileName={`${reference} labels.pdf`}
        label="Shelf labels (PDF)"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  documents: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
