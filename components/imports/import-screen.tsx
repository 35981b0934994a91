import { can } from '@/shared/contract/roles';
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { SPEC_SHEET_ENCODINGS_TEXT } from '@/shared/encodings';
import type { PickedFile } from '../api/upload';
import { formatSize, pickCsv } from '../attachments/pick-file';
import { downloadImportTemplate, IMPORT_KINDS, refusedRun, useImportRunMutation, type ImportKind, type ImportRun } from '../data/imports';
import { LinkButton } from '../ui/link-button';
import { SectionTitle } from '../ui/section-title';
import { Screen } from '../screen';
import { useSession } from '../session';
import { colors, fonts, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { UploadProgress } from '../ui/progress-bar';
import { ErrorState } from '../ui/states';
import { useIsWide } from '../use-layout';
import { ImportHistory } from './import-history';
import { ImportResult } from './import-result';
import { KIND_HINTS, KIND_LABELS, plural } from './labels';

const TITLE = 'Import spec sheets';
const KIND_OPTIONS = IMPORT_KINDS.map((k) => ({ value: k, label: KIND_LABELS[k] }));

/** Supplier spec sheets into the registry: checked first (a dry run), then written whole or not at all. */
export function ImportScreen() {
  const { session } = useSession();
  if (!can(session?.user.role, 'import-records')) {
    return (
      <Screen title={TITLE} testID="import-screen">
        <Card testID="import-not-allowed">
          <SectionTitle>Engineers import spec sheets</SectionTitle>
          <Text style={type.body}>
            Bringing a supplier's sheet into the registry changes the parts every fit check relies on, so engineers and administrators do it. Ask an engineer to import the sheet; every table in the
            registry stays open to you to read.
          </Text>
          <View style={styles.row}>
            <LinkButton href="/registry/drum-types" label="Go to the registry" testID="import-not-allowed-registry" />
          </View>
        </Card>
      </Screen>
    );
  }
  return <ImportFlow />;
}

function ImportFlow() {
  const wide = useIsWide();
  const [kind, setKind] = useState<ImportKind | null>(null);
  const [file, setFile] = useState<PickedFile | null>(null);
  const [progress, setProgress] = useState(0);
  const [pickError, setPickError] = useState<string | null>(null);
  const [template, setTemplate] = useState<{ busy: boolean; error: string | null }>({ busy: false, error: null });
  const dry = useImportRunMutation();
  const commit = useImportRunMutation();

  const check = (k: ImportKind, f: PickedFile) => {
    commit.reset();
    setProgress(0);
    dry.mutate({ kind: k, file: f, dryRun: true, onProgress: setProgress });
  };
  const chooseKind = (k: ImportKind) => {
    setKind(k);
    // A file already chosen is checked again against the columns of the new kind.
    if (file && k !== kind) check(k, file);
  };
  const chooseFile = () => {
    // Not disabled while a file is on its way (a disabled button keeps a stale focus ring on the web): ignored.
    if (!kind || dry.isPending || commit.isPending) return;
    setPickError(null);
    pickCsv().then(
      (f) => {
        if (!f) return;
        setFile(f);
        check(kind, f);
      },
      (e: unknown) => setPickError(e instanceof Error ? e.message : 'The file could not be read.'),
    );
  };
  const importNow = () => {
    if (!kind || !file) return;
    setProgress(0);
    commit.mutate({ kind, file, dryRun: false, onProgress: setProgress });
  };
  const startOver = () => {
    setFile(null);
    dry.reset();
    commit.reset();
  };
  const getTemplate = () => {
    if (!kind) return;
    setTemplate({ busy: true, error: null });
    downloadImportTemplate(kind).then(
      () => setTemplate({ busy: false, error: null }),
      (e: unknown) => setTemplate({ busy: false, error: e instanceof Error ? e.message : 'The template could not be fetched.' }),
    );
  };

  const kindCard = (
    <Card style={wide ? styles.half : undefined} testID="import-step-kind">
      <SectionTitle>1. What the file holds</SectionTitle>
      <ChoiceChips label="Registry table" options={KIND_OPTIONS} value={kind} onChange={chooseKind} testID="import-kind" />
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
              onPress={getTemplate}
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

  const busyDry = dry.isPending;
  const fileCard = (
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
      {busyDry && file ? <UploadProgress fileName={file.name} fraction={progress} working="Checking every row against the registry…" testID="import-progress" /> : null}
      <View style={styles.row}>
        <Button label={file ? 'Choose another file' : 'Choose a CSV file'} variant={file ? 'secondary' : 'primary'} disabled={!kind} onPress={chooseFile} testID="import-choose" />
      </View>
      {!kind ? <Text style={type.small}>Choose what the file holds (step 1) to choose the file.</Text> : null}
      {pickError ? (
        <Text role="alert" style={styles.error} testID="import-pick-error">
          {pickError}
        </Text>
      ) : null}
    </Card>
  );

  return (
    <Screen title={TITLE} subtitle="A supplier's sheet into the registry: checked row by row first, then imported whole or not at all." testID="import-screen">
      <View style={[styles.steps, wide && styles.stepsWide]}>
        {kindCard}
        {fileCard}
      </View>
      {dry.isError && file && kind ? (
        <View testID="import-check-error">
          <ErrorState error={dry.error} onRetry={() => check(kind, file)} />
        </View>
      ) : null}
      {commit.isSuccess ? (
        <Done run={commit.data} onAgain={startOver} />
      ) : dry.isSuccess && kind && file ? (
        <CommitStep run={dry.data} busy={commit.isPending} progress={progress} error={commit.error} onImport={importNow} onCancel={startOver} />
      ) : null}
      <ImportHistory />
    </Screen>
  );
}

interface CommitStepProps {
  run: ImportRun;
  busy: boolean;
  progress: number;
  error: Error | null;
  onImport: () => void;
  onCancel: () => void;
}

/** The dry run's findings and the import button, enabled only when no row is rejected. */
function CommitStep({ run, busy, progress, error, onImport, onCancel }: CommitStepProps) {
  const refused = refusedRun(error);
  // The file changed under us between the check and the import (or someone else's rows did): show why.
  if (refused) {
    return (
      <ImportResult
        run={refused}
        title="Nothing was imported"
        lead={error?.message}
        testID="import-refused"
        footer={
          <View style={styles.row}>
            <Button label="Start again" variant="secondary" onPress={onCancel} testID="import-start-over" />
          </View>
        }
      />
    );
  }
  const { counts } = run;
  const toWrite = counts.new + counts.changed;
  const ready = counts.rejected === 0 && toWrite > 0;
  const note =
    counts.rejected > 0
      ? `Import is off: ${plural(counts.rejected, 'row')} rejected. Correct the file and choose it again.`
      : toWrite === 0
        ? 'Every row already matches the registry: there is nothing to import.'
        : `${counts.new} new and ${counts.changed} changed, written together in one step: if anything fails, nothing is written.`;
  return (
    <ImportResult
      run={run}
      title="Checked: nothing written yet"
      footer={
        <View style={styles.commit}>
          {busy ? <UploadProgress fileName={run.fileName} fraction={progress} working="Writing to the registry…" testID="import-commit-progress" /> : null}
          <Text style={[type.body, counts.rejected > 0 && styles.noteBad]} testID="import-commit-note">
            {note}
          </Text>
          <View style={styles.row}>
            <Button label={`Import ${plural(toWrite, 'row')}`} disabled={!ready} busy={busy} onPress={onImport} testID="import-commit" />
            <Button label="Cancel" variant="secondary" disabled={busy} onPress={onCancel} testID="import-cancel" />
          </View>
          {error ? (
            <View testID="import-commit-error">
              <ErrorState error={error} onRetry={onImport} />
            </View>
          ) : null}
        </View>
      }
    />
  );
}

function Done({ run, onAgain }: { run: ImportRun; onAgain: () => void }) {
  const { counts } = run;
  return (
    <Card style={styles.done} testID="import-done">
      <SectionTitle>Imported</SectionTitle>
      <Text style={type.body} accessibilityLiveRegion="polite" testID="import-done-summary">
        {run.fileName} is in the registry: {counts.new} new, {counts.changed} changed and {counts.unchanged} unchanged {KIND_LABELS[run.kind].toLowerCase()}.
      </Text>
      <View style={styles.row}>
        <LinkButton href={`/registry/${run.kind}`} label={`Open ${KIND_LABELS[run.kind].toLowerCase()}`} variant="primary" testID="import-done-list" />
        <Button label="Import another file" variant="secondary" onPress={onAgain} testID="import-again" />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  steps: { gap: space.lg },
  stepsWide: { flexDirection: 'row', alignItems: 'stretch' },
  half: { flex: 1, minWidth: 0 },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
  chosen: { gap: 2, padding: space.md, borderRadius: radius.md, backgroundColor: colors.surfaceSunk },
  strong: { fontFamily: fonts.semibold },
  commit: { gap: space.sm, marginTop: space.sm, paddingTop: space.md, borderTopWidth: 1, borderTopColor: colors.line },
  noteBad: { color: colors.danger, fontFamily: fonts.semibold },
  done: { borderLeftWidth: 5, borderLeftColor: colors.fits },
  error: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
});
