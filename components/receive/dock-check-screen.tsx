import { useEffect } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { can } from '@/shared/contract/roles';
import { Screen } from '../screen';
import { useSession } from '../session';
import { colors, fonts, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { HandlingCaution } from '../ui/handling-caution';
import { DockDrumCard, DockStationCard } from './dock-drum-card';
import { DockConditionCard, DockLotCard } from './dock-lot-card';
import { DockResult, HistoryLink, RESULT_ID } from './dock-result';
import { LinkButton } from '../ui/link-button';
import { revealNativeId } from './reveal';
import { useDockForm } from './use-dock-form';
import { ProvisionalResult } from './provisional-result';
import { WaitingChecks } from './waiting-checks';

/**
 * The dock check: a lot's drums checked against the site's hardware and the lot against its slurry's
 * acceptance rules, recorded, and held or quarantined when the verdict says so.
 */
export function DockCheckScreen() {
  const { session } = useSession();
  const form = useDockForm();
  const shown = !!form.recordId || !!form.provisional;

  // The verdict replaces the form: bring its top into view (the form was scrolled to its submit button).
  useEffect(() => {
    if (shown) revealNativeId(RESULT_ID);
  }, [shown, form.recordId, form.provisional]);

  if (session && !can(session.user.role, 'check-lots')) {
    return (
      <Screen title="Dock check" subtitle="Clerks, engineers and administrators record dock checks." testID="dock-screen">
        <Card>
          <Text style={type.body}>You can read every recorded check and its verdict in the history.</Text>
          <LinkButton href="/receive/history" label="Open the check history" variant="primary" testID="dock-history-link" />
        </Card>
      </Screen>
    );
  }
  if (form.recordId) return <DockResult recordId={form.recordId} onAgain={form.startAgain} />;
  if (form.provisional) return <ProvisionalResult shown={form.provisional} onAgain={form.startAgain} />;

  const footer = (
    <View style={styles.submit}>
      {form.formError ? (
        <Text role="alert" style={styles.formError} testID="dock-error">
          {form.formError}
        </Text>
      ) : null}
      <Button label="Check and record the lot" busy={form.saving} onPress={form.submit} testID="dock-submit" />
    </View>
  );
  return (
    <Screen
      title="Dock check"
      subtitle="Check an arriving lot against the site's tubes and heads, and its dates and condition, before its drums go to a station."
      actions={<HistoryLink />}
      testID="dock-screen"
      footer={footer}
      columns={[
        <>
          <DockLotCard form={form} />
          <DockConditionCard form={form} />
        </>,
        <>
          <DockDrumCard form={form} />
          <DockStationCard form={form} />
        </>,
      ]}
    >
      <HandlingCaution />
      <WaitingChecks />
    </Screen>
  );
}

const styles = StyleSheet.create({
  submit: { gap: space.xs },
  formError: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
});
