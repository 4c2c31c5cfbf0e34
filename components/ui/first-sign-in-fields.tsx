import type { FieldErrors } from '../forms';
import { TextField } from './text-field';

type FirstSignInFieldsProps = {
  email: string;
  password: string;
  onChange: (key: 'email' | 'password') => (value: string) => void;
  errors: FieldErrors;
};

/** The e-mail and first password of a new sign-in (a fitter's, or a player's). */
export function FirstSignInFields({ email, password, onChange, errors }: FirstSignInFieldsProps) {
  return (
    <>
      <TextField
        label="E-mail"
        value={email}
        onChangeText={onChange('email')}
        error={errors.email}
        autoCapitalize="none"
        inputMode="email"
        keyboardType="email-address"
      />
      <TextField
        label="First password"
        value={password}
        onChangeText={onChange('password')}
        error={errors.password}
        hint="At least 10 characters."
        secureTextEntry
        autoComplete="new-password"
      />
    </>
  );
}
