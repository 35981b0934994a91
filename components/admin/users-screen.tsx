import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { MIN_PASSWORD_LENGTH } from '@/shared/passwords';
import { DEFAULT_ROLE, ROLE_LABELS, ROLES, type Role } from '@/shared/contract/roles';
import { ApiError } from '../api/client';
import { useUserCreateMutation, useUsersQuery, useUserUpdateMutation, type UserRecord } from '../data/users';
import { Screen } from '../screen';
import { useSession } from '../session';
import { colors, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { EmptyState, ErrorState, LoadingState } from '../ui/states';
import { TextField } from '../ui/text-field';
import { ResetPasswordPanel } from './reset-password-panel';

const roleOptions = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

function NewUserForm() {
  const create = useUserCreateMutation();
  const [form, setForm] = useState({ email: '', name: '', role: DEFAULT_ROLE as Role, temporaryPassword: '' });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [done, setDone] = useState<string | null>(null);
  const submit = () => {
    setDone(null);
    create.mutate(form, {
      onSuccess: (u) => {
        setErrors({});
        setDone(`${u.name} can now sign in with the temporary password.`);
        setForm({ email: '', name: '', role: DEFAULT_ROLE, temporaryPassword: '' });
      },
      onError: (err) => setErrors(err instanceof ApiError ? { ...err.fieldMessages(), form: err.message } : { form: String(err) }),
    });
  };
  return (
    <Card testID="new-user-form">
      <Text role="heading" aria-level={2} style={type.heading}>
        Add a person
      </Text>
      <TextField label="Name" value={form.name} onChangeText={(name) => setForm({ ...form, name })} error={errors.name} testID="user-name" />
      <TextField label="Work e-mail" value={form.email} onChangeText={(email) => setForm({ ...form, email })} error={errors.email} autoCapitalize="none" inputMode="email" testID="user-email" />
      <ChoiceChips label="Role" options={roleOptions} value={form.role} onChange={(role) => setForm({ ...form, role })} error={errors.role} testID="user-role" />
      <TextField
        label="Temporary password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters. Share it in person; they change it after signing in.`}
        value={form.temporaryPassword}
        onChangeText={(temporaryPassword) => setForm({ ...form, temporaryPassword })}
        error={errors.temporaryPassword}
        secureTextEntry
        testID="user-password"
      />
      {errors.form ? (
        <Text role="alert" style={{ ...type.body, color: colors.danger }}>
          {errors.form}
        </Text>
      ) : null}
      {done ? (
        <Text role="status" style={{ ...type.body, color: colors.fits }}>
          {done}
        </Text>
      ) : null}
      <Button label="Add person" onPress={submit} busy={create.isPending} testID="user-create" />
    </Card>
  );
}

function UserCard({ user, self }: { user: UserRecord; self: boolean }) {
  const update = useUserUpdateMutation();
  return (
    <Card testID={`user-row-${user.email}`}>
      <Text style={type.heading}>{user.name}</Text>
      <Text style={type.small}>
        {user.email} · {ROLE_LABELS[user.role]} · {user.active ? 'active' : 'deactivated'}
        {user.mustChangePassword ? ' · on a temporary password' : ''}
      </Text>
      {self ? (
        <Text style={type.small}>This is you. Change your own password under Notices.</Text>
      ) : (
        <View style={styles.actions}>
          <ChoiceChips label="Role" options={roleOptions} value={user.role} onChange={(role) => update.mutate({ id: user.id, role })} />
          <Button
            label={user.active ? 'Deactivate' : 'Reactivate'}
            variant={user.active ? 'danger' : 'secondary'}
            onPress={() => update.mutate({ id: user.id, active: !user.active })}
            busy={update.isPending}
            testID={`user-toggle-${user.email}`}
          />
          {update.error ? <Text style={{ ...type.small, color: colors.danger }}>{update.error.message}</Text> : null}
          <ResetPasswordPanel user={user} />
        </View>
      )}
    </Card>
  );
}

export function UsersScreen() {
  const { session } = useSession();
  const users = useUsersQuery();
  let list;
  if (users.isPending) list = <LoadingState label="Loading people…" />;
  else if (users.isError) list = <ErrorState error={users.error} onRetry={() => users.refetch()} />;
  else if (users.data.items.length === 0) list = <EmptyState title="No people yet" next="Add the first person with the form." />;
  else list = users.data.items.map((u) => <UserCard key={u.id} user={u} self={u.id === session?.user.id} />);
  return <Screen title="People" subtitle="Who can sign in, and with which role." testID="users-screen" columns={[<View style={styles.col}>{list}</View>, <NewUserForm />]} split={[3, 2]} />;
}

const styles = StyleSheet.create({
  col: { gap: space.md },
  actions: { gap: space.sm },
});
