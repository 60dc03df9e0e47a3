import { useState } from 'react';
import { newPasswordSchema, passwordRules } from '@shared/schemas/auth';
import { TextField } from '@/components/text-field';

export interface NewPassword {
  password: string;
  confirm: string;
}

/** What is wrong with the new password before it is sent (the server checks again, and more). */
export function newPasswordErrors(value: NewPassword): { password?: string; confirm?: string } {
  const shape = newPasswordSchema.safeParse(value.password);
  return {
    ...(shape.success ? {} : { password: shape.error.issues[0]?.message }),
    ...(value.confirm !== value.password ? { confirm: 'The two passwords differ.' } : {}),
  };
}

const empty: NewPassword = { password: '', confirm: '' };

/** The new password's state; errors show once the user has tried to send the form. */
export function useNewPasswordForm() {
  const [value, setValue] = useState<NewPassword>(empty);
  const [tried, setTried] = useState(false);
  return {
    value,
    setValue,
    errors: tried ? newPasswordErrors(value) : {},
    /** Marks the form as tried; true when it may be sent. */
    check: () => {
      setTried(true);
      return Object.keys(newPasswordErrors(value)).length === 0;
    },
    reset: () => {
      setValue(empty);
      setTried(false);
    },
  };
}

const hint = `${passwordRules.min} to ${passwordRules.max} characters. A phrase of unrelated words works well; common passwords are refused.`;

/** The new password and its confirmation, with errors beside each field. */
export function NewPasswordFields({
  idPrefix,
  value,
  onChange,
  errors,
}: {
  idPrefix: string;
  value: NewPassword;
  onChange: (next: NewPassword) => void;
  errors: { password?: string | undefined; confirm?: string | undefined };
}) {
  return (
    <>
      <TextField
        id={`${idPrefix}-password`}
        label="New password"
        type="password"
        autoComplete="new-password"
        required
        hint={hint}
        value={value.password}
        onValue={(password) => onChange({ ...value, password })}
        error={errors.password}
      />
      <TextField
        id={`${idPrefix}-confirm`}
        label="New password again"
        type="password"
        autoComplete="new-password"
        required
        value={value.confirm}
        onValue={(confirm) => onChange({ ...value, confirm })}
        error={errors.confirm}
      />
    </>
  );
}
