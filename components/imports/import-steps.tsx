import { StyleSheet, Text, View } from 'react-native';
import { SPEC_SHEET_ENCODINGS_TEXT } from '@/shared/encodings';
import { formatSize } from '../attachments/pick-file';
import { IMPORT_KINDS } from '../data/imports';
import { SectionTitle } from '../ui/section-title';
import { colors, fonts, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { UploadProgress } from '../ui/progress-bar';
import { KIND_HINTS, KIND_LABELS } from './labels';
import type { ImportFlowState } from './use-import-flow';

const KIND_OPTIONS = IMPORT_KINDS.map((k) => ({ value: k, label: KIND_LABELS[k] }));

/** Step 1: which registry table the file holds, and its CSV template. */
export function KindStep({ flow, wide }: { flow: ImportFlowState; wide: boolean }) {
  const { kind, template } = flow;
  return (
    <Card style={wide ? styles.half : undefined} testID="import-step-kind">
      <SectionTitle>1. What the file holds</SectionTitle>
      <ChoiceChips label="Registry table" options={KIND_OPTIONS} value={kind} onChange={flow.chooseKind} testID="import-kind" />
      {kind ? (
        <>
          <Text style={type.small} testID="import-kind-hint">
            {KIND_HINTS[kind]}
          </Text>
          <View style={styles.row}>
            <Button
              label={`Download the ${KIND_LABELS[kind].toLowerCase()} template`}
              variant="quiet"
              busy={template.busy}
              onPress={flow.getTemplate}
              accessibilityLabel={`Download the CSV template for ${KIND_LABELS[kind].toLowerCase()}: its columns and an example row`}
              testID="import-template"
            />
          </View>
          {template.error ? (
            <Text role="alert" style={styles.error} testID="import-template-error">
              {template.error}
            </Text>
          ) : null}
        </>
      ) : (
        <Text style={type.small}>Choose the table first: its columns decide how the file is read, and its template shows them.</Text>
      )}
    </Card>
  );
}

/** Step 2: the CSV file, checked as soon as it is chosen. */
export function FileStep({ flow, wide }: { flow: ImportFlowState; wide: boolean }) {
  const { kind, file, progress, pickError } = flow;
  return (
    <Card style={wide ? styles.half : undefined} testID="import-step-file">
      <SectionTitle>2. The CSV file</SectionTitle>
      <Text style={type.small}>Comma- or semicolon-separated, in {SPEC_SHEET_ENCODINGS_TEXT}. It is checked first; nothing is written until you import it.</Text>
      {file ? (
        <View style={styles.chosen} testID="import-file">
          <Text style={[type.body, styles.strong]} testID="import-file-name">
            {file.name}
          </Text>
          {file.size != null ? <Text style={type.small}>{formatSize(file.size)}</Text> : null}
        </View>
      ) : null}
      {flow.dry.isPending && file ? <UploadProgress fileName={file.name} fraction={progress} working="Checking every row against the registry…" testID="import-progress" /> : null}
      <View style={styles.row}>
        <Button label={file ? 'Choose another file' : 'Choose a CSV file'} variant={file ? 'secondary' : 'primary'} disabled={!kind} onPress={flow.chooseFile} testID="import-choose" />
      </View>
      {!kind ? <Text style={type.small}>Choose what the file holds (step 1) to choose the file.</Text> : null}
      {pickError ? (
        <Text role="alert" style={styles.error} testID="import-pick-error">
          {pickError}
        </Text>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  half: { flex: 1, minWidth: 0 },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
  chosen: { gap: 2, padding: space.md, borderRadius: radius.md, backgroundColor: colors.surfaceSunk },
  strong: { fontFamily: fonts.semibold },
  error: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
});
