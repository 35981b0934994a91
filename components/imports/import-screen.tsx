import { can } from '@/shared/contract/roles';
import { StyleSheet, Text, View } from 'react-native';
import { refusedRun, type ImportRun } from '../data/imports';
import { LinkButton } from '../ui/link-button';
import { SectionTitle } from '../ui/section-title';
import { Screen } from '../screen';
import { useSession } from '../session';
import { colors, fonts, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { UploadProgress } from '../ui/progress-bar';
import { ErrorState } from '../ui/states';
import { useIsWide } from '../use-layout';
import { ImportHistory } from './import-history';
import { ImportResult } from './import-result';
import { FileStep, KindStep } from './import-steps';
import { KIND_LABELS, plural } from './labels';
import { useImportFlow } from './use-import-flow';

const TITLE = 'Import spec sheets';

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
  const flow = useImportFlow();
  const { kind, file, progress, dry, commit } = flow;
  return (
    <Screen title={TITLE} subtitle="A supplier's sheet into the registry: checked row by row first, then imported whole or not at all." testID="import-screen">
      <View style={[styles.steps, wide && styles.stepsWide]}>
        <KindStep flow={flow} wide={wide} />
        <FileStep flow={flow} wide={wide} />
      </View>
      {dry.isError && file && kind ? (
        <View testID="import-check-error">
          <ErrorState error={dry.error} onRetry={() => flow.check(kind, file)} />
        </View>
      ) : null}
      {commit.isSuccess ? (
        <Done run={commit.data} onAgain={flow.startOver} />
      ) : dry.isSuccess && kind && file ? (
        <CommitStep run={dry.data} busy={commit.isPending} progress={progress} error={commit.error} onImport={flow.importNow} onCancel={flow.startOver} />
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
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
  commit: { gap: space.sm, marginTop: space.sm, paddingTop: space.md, borderTopWidth: 1, borderTopColor: colors.line },
  noteBad: { color: colors.danger, fontFamily: fonts.semibold },
  done: { borderLeftWidth: 5, borderLeftColor: colors.fits },
});
