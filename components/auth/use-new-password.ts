import { useState } from 'react';
import { passwordProblem } from '@/shared/passwords';
import { formProblemOf, sentence, type FieldErrors } from '../ui/form-errors';

/** The labels of the password forms, by the API's field names (one place for the words the messages use). */
export const PASSWORD_LABELS: Record<string, string> = {
  currentPassword: 'Current password',
  newPassword: 'New password',
  repeat: 'New password again',
  token: 'The reset link',
};

/**
 * A new password typed twice, checked against the shared rule before it is sent, and the server's answer
 * read back onto the fields. The change and the reset forms keep their state here.
 */
export function useNewPassword(labels: Record<string, string> = PASSWORD_LABELS) {
  const [newPassword, setNewPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [errors, setErrors] = useState<FieldErrors>({});
  const [formError, setFormError] = useState<string | null>(null);
  // Typing through gloves on a phone: the person may choose to see what they type.
  const [shown, setShown] = useState(false);

  /** Field messages for the new password (and any extra fields the form checks); empty when it may be sent. */
  const check = (extra: FieldErrors = {}): boolean => {
    const found: FieldErrors = { ...extra };
    const problem = passwordProblem(newPassword);
    if (!newPassword) found.newPassword = `Enter a ${labels.newPassword.toLowerCase()}.`;
    else if (problem) found.newPassword = sentence(labels.newPassword, problem);
    if (newPassword && repeat !== newPassword) found.repeat = 'The two new passwords are not the same; type it again.';
    setErrors(found);
    setFormError(null);
    return Object.keys(found).length === 0;
  };

  const fail = (err: unknown) => {
    const problem = formProblemOf(err, (path) => labels[path]);
    setErrors(problem.fields);
    setFormError(problem.form);
  };

  const clear = () => {
    setNewPassword('');
    setRepeat('');
    setErrors({});
    setFormError(null);
  };

  return { newPassword, setNewPassword, repeat, setRepeat, errors, formError, check, fail, clear, shown, toggleShown: () => setShown((v) => !v) };
}
