import { router } from 'expo-router';
import { Children, type ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { Screen } from '../screen';
import { REGISTRY_RESOURCES, type RegistryResource } from '../registry/resources';
import { useCanEditRegistry } from '../registry/use-can-edit-registry';
import { colors, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorState, LoadingState } from '../ui/states';
import { useIsWide } from '../use-layout';
import { ConflictNotice } from './conflict-notice';
import type { Draft } from './draft';
import type { RecordForm } from './use-record-form';

/** Back where the person came from, or to `fallback` when the page was opened directly. */
export function leave(fallback: string): void {
  if (router.canGoBack()) router.back();
  else router.replace(fallback as never);
}

/** A titled group of fields; on a wide screen groups sit two to a row unless `full`. */
export function FormSection({ title, children, full, testID }: { title: string; children: ReactNode; full?: boolean; testID?: string }) {
  const wide = useIsWide();
  return (
    <Card style={[styles.section, wide && (full ? styles.sectionFull : styles.sectionHalf)]} testID={testID}>
      <Text role="heading" aria-level={2} style={type.heading}>
        {title}
      </Text>
      {children}
    </Card>
  );
}

/** Fields side by side, sharing the width, on a wide screen; stacked on a phone. */
export function FieldRow({ children }: { children: ReactNode }) {
  const wide = useIsWide();
  return (
    <View style={wide ? styles.fieldRow : styles.fieldCol}>
      {Children.toArray(children).map((child, i) => (
        <View key={i} style={wide ? styles.cell : undefined}>
          {child}
        </View>
      ))}
    </View>
  );
}

interface FormFrameProps<R extends { id: string; version: number }, D extends Draft> {
  form: RecordForm<R, D>;
  /** A registry resource's form: its title ("New dip tube", "Edit dip tube <name>") and where Cancel goes come from it. */
  resource?: RegistryResource;
  /** The record's id when editing. */
  id?: string;
  /** The record's name in the title when editing: its part number or name. */
  name?: string;
  /** The page title, when not a registry resource's. */
  title?: string;
  subtitle?: string;
  testID: string;
  /** Where Cancel goes when there is no page to go back to (a registry resource's: its page, or its list). */
  cancelTo?: string;
  /** Beside the fields on a wide screen, below them on a phone (the pairing's fit preview). */
  aside?: ReactNode;
  children: ReactNode;
}

/**
 * The page around every registry form: who may use it, loading the record to edit, the fields, what the
 * server said, the conflict notice and the Cancel / Save buttons (last, so they come last in tab order).
 */
export function FormFrame<R extends { id: string; version: number }, D extends Draft>(props: FormFrameProps<R, D>) {
  const { form, resource, id, name, subtitle, testID, aside, children } = props;
  const noun = resource ? REGISTRY_RESOURCES[resource].noun.one : '';
  const title = props.title ?? (id ? `Edit ${noun} ${name ?? ''}`.trim() : `New ${noun}`);
  const cancelTo = props.cancelTo ?? (id ? `/registry/${resource}/${id}` : `/registry/${resource}`);
  const wide = useIsWide();
  const canEdit = useCanEditRegistry();

  if (!canEdit) {
    return (
      <Screen title={title} testID={testID}>
        <Card testID="form-read-only">
          <Text style={type.label}>Only engineers and administrators change the registry.</Text>
          <Text style={type.body}>You can still look everything up in the registry.</Text>
          <View style={styles.actionsStart}>
            <Button label="Back" variant="secondary" onPress={() => leave(cancelTo)} testID="form-cancel" />
          </View>
        </Card>
      </Screen>
    );
  }

  if (form.mode === 'update' && !form.base) {
    return (
      <Screen title={title} testID={testID}>
        {form.detail.isError ? <ErrorState error={form.detail.error} onRetry={() => form.detail.refetch()} /> : <LoadingState label="Loading the record…" />}
      </Screen>
    );
  }

  const status = (
    <>
      {form.notice ? (
        <View style={[styles.banner, styles.notice]} role="status" testID="form-notice">
          <Text style={type.body}>{form.notice}</Text>
        </View>
      ) : null}
      {form.conflict ? <ConflictNotice conflict={form.conflict} onReapply={form.reapplyMine} onTakeTheirs={form.takeTheirs} /> : null}
      {form.formError ? (
        <View style={[styles.banner, styles.error]} role="alert" testID="form-error">
          <Text style={[type.body, { color: colors.danger }]}>{form.formError}</Text>
        </View>
      ) : null}
    </>
  );
  const footer = (
    <View style={[styles.actions, wide && styles.actionsWide]}>
      <View style={!wide && styles.grow}>
        <Button label="Cancel" variant="secondary" onPress={() => leave(cancelTo)} testID="form-cancel" />
      </View>
      <View style={!wide && styles.grow}>
        {/* Not `busy`: a Button disabled while focused keeps its focus ring after focus moves on (react-native-web). submit() ignores presses while saving. */}
        <Button label={form.saving ? 'Saving…' : form.mode === 'create' ? 'Save' : 'Save changes'} onPress={form.submit} accessibilityState={{ busy: form.saving }} testID="form-submit" />
      </View>
    </View>
  );
  const fields = <View style={[styles.fields, wide && styles.fieldsWide]}>{children}</View>;

  // With an aside, a wide screen puts it in a column beside the form; a phone shows it before the buttons.
  const beside = !!aside && wide;
  const main = (
    <>
      {fields}
      {status}
      {footer}
    </>
  );
  return (
    <Screen title={title} subtitle={subtitle} testID={testID} columns={beside ? [main, aside] : undefined} split={[3, 2]}>
      {beside ? null : (
        <>
          {fields}
          {aside}
          {status}
          {footer}
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  fields: { gap: space.lg },
  fieldsWide: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start' },
  section: { gap: space.md },
  sectionHalf: { flexBasis: '45%', flexGrow: 1, minWidth: 320 },
  sectionFull: { flexBasis: '100%' },
  fieldRow: { flexDirection: 'row', gap: space.md, alignItems: 'flex-start' },
  fieldCol: { gap: space.md },
  cell: { flex: 1, minWidth: 0 },
  banner: { borderRadius: radius.md, padding: space.md, borderWidth: 1.5 },
  notice: { backgroundColor: colors.surface, borderColor: colors.primary },
  error: { backgroundColor: colors.dangerSoft, borderColor: colors.danger },
  actions: { flexDirection: 'row', gap: space.sm },
  actionsWide: { justifyContent: 'flex-end' },
  actionsStart: { flexDirection: 'row' },
  grow: { flex: 1 },
});
