import { PASSWORD_RULE_TEXT } from '@/shared/passwords';
import { Button } from '../ui/button';
import { TextField } from '../ui/text-field';
import type { useNewPassword } from './use-new-password';

/** The new password twice, with the rule beside it and a way to see what is typed. */
export function NewPasswordFields({ form, onSubmit, testID }: { form: ReturnType<typeof useNewPassword>; onSubmit: () => void; testID: string }) {
  // Both inputs hide what is typed (until shown) and let a password manager offer a new password.
  const secret = { secureTextEntry: !form.shown, autoCapitalize: 'none', autoComplete: 'new-password' } as const;
  return (
    <>
      <TextField label="New password" hint={PASSWORD_RULE_TEXT} value={form.newPassword} onChangeText={form.setNewPassword} error={form.errors.newPassword} {...secret} testID={`${testID}-new`} />
      <TextField
        label="New password again"
        value={form.repeat}
        onChangeText={form.setRepeat}
        error={form.errors.repeat}
        {...secret}
        returnKeyType="go"
        onSubmitEditing={onSubmit}
        testID={`${testID}-repeat`}
      />
      <Button label={form.shown ? 'Hide the passwords' : 'Show the passwords'} variant="quiet" onPress={form.toggleShown} testID={`${testID}-show`} />
    </>
  );
}
