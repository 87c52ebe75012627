import { Field } from '@/components/ui/Field';

/** The length the server asks of a new password (its schema refuses a shorter one with a message). */
const MIN_LENGTH = 12;

/** A field for choosing a password, which a password manager treats as a new one, of the length the server asks. */
export function NewPasswordField({
  label = 'Password',
  name = 'password',
  hint = `At least ${MIN_LENGTH} characters.`,
  error,
  autoFocus,
}: {
  label?: string;
  name?: string;
  hint?: string;
  error?: string | null;
  autoFocus?: boolean;
}) {
  return (
    <Field
      label={label}
      name={name}
      type="password"
      autoComplete="new-password"
      required
      minLength={MIN_LENGTH}
      autoFocus={autoFocus}
      hint={hint}
      error={error}
    />
  );
}
