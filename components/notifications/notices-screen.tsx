import { NOTICE_KIND_WORDS } from '@/shared/contract/notice-kinds';
import { useRouter } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { useMarkAllNoticesReadMutation, useMarkNoticeReadMutation, useNotificationsQuery, type NoticeRecord } from '../data/notifications';
import { formatWhen } from '../ui/format';
import { Screen } from '../screen';
import { AppearanceCard } from '../settings/appearance-card';
import { colors, fonts, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { EmptyState, ErrorState, LoadingState } from '../ui/states';
import { PasswordCard } from '../auth/password-card';
import { MailPreferencesCard } from './mail-preferences-card';

/** Unread first, then newest first. */
export function sortNotices(items: NoticeRecord[]): NoticeRecord[] {
  return [...items].sort((a, b) => Number(!!a.readAt) - Number(!!b.readAt) || b.createdAt.localeCompare(a.createdAt));
}

/** The signed-in person's notices: what happened, a link to it, and marking it read. */
export function NoticesScreen() {
  const router = useRouter();
  const list = useNotificationsQuery();
  const readAll = useMarkAllNoticesReadMutation();
  const unread = list.data?.unread ?? 0;
  let notices;
  if (list.isPending) notices = <LoadingState label="Loading notices…" />;
  else if (list.isError) notices = <ErrorState error={list.error} onRetry={() => list.refetch()} />;
  else if (list.data.items.length === 0)
    notices = (
      <EmptyState
        title="No notices"
        next="You are told here when a lot is held at the dock, a plan needs hardware, or a pairing needs your review."
        action={{ label: 'Go home', onPress: () => router.push('/') }}
      />
    );
  else
    notices = (
      <View role="list" aria-label="Notices" style={styles.list} testID="notices-list">
        {sortNotices(list.data.items).map((n) => (
          <NoticeRow key={n.id} n={n} />
        ))}
      </View>
    );
  // On a wide screen the person's settings (e-mail choices, password, colours) sit beside the notices; on a phone, after them.
  const settings = (
    <>
      <MailPreferencesCard />
      <PasswordCard />
      <AppearanceCard />
    </>
  );
  return (
    <Screen
      title="Notices"
      subtitle={list.data ? (unread ? `${unread} unread` : 'All read') : undefined}
      actions={unread ? <Button label="Mark all read" variant="secondary" busy={readAll.isPending} onPress={() => readAll.mutate()} testID="notices-read-all" /> : undefined}
      testID="notices-screen"
      columns={[notices, settings]}
      split={[2, 1]}
    >
      {readAll.isError ? (
        <Text role="alert" style={styles.error}>
          {readAll.error.message}
        </Text>
      ) : null}
    </Screen>
  );
}

function NoticeRow({ n }: { n: NoticeRecord }) {
  const router = useRouter();
  const read = useMarkNoticeReadMutation();
  const unread = !n.readAt;
  const open = () => {
    if (unread) read.mutate(n.id);
    if (n.link) router.push(n.link as never);
  };
  return (
    <View role="listitem">
      <Card style={unread ? styles.unread : undefined} testID={`notice-${n.id}`}>
        <View style={styles.head}>
          <Text style={[styles.kind, unread && styles.kindUnread]}>{unread ? `● New · ${NOTICE_KIND_WORDS[n.kind].tag}` : NOTICE_KIND_WORDS[n.kind].tag}</Text>
          <Text style={type.small}>{formatWhen(n.createdAt)}</Text>
        </View>
        <Text style={[type.heading, !unread && { fontFamily: fonts.regular }]} testID={`notice-${n.id}-title`}>
          {n.title}
        </Text>
        <Text style={type.body}>{n.body}</Text>
        <View style={styles.buttons}>
          {n.link ? <Button label="Open" onPress={open} accessibilityLabel={`Open: ${n.title}`} testID={`notice-${n.id}-open`} /> : null}
          {unread ? (
            <Button label="Mark read" variant="secondary" busy={read.isPending} onPress={() => read.mutate(n.id)} accessibilityLabel={`Mark read: ${n.title}`} testID={`notice-${n.id}-read`} />
          ) : null}
        </View>
        {read.isError ? (
          <Text role="alert" style={styles.error}>
            {read.error.message}
          </Text>
        ) : null}
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  unread: { borderLeftWidth: 5, borderLeftColor: colors.primary, borderRadius: radius.lg },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  kind: { fontFamily: fonts.semibold, fontSize: 14, color: colors.inkMuted },
  kindUnread: { color: colors.primary },
  buttons: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  error: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
});
