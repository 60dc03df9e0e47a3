import { newPasswordSchema, passwordRules } from '@shared/schemas/auth';
import { FormField, describedBy, inputClass } from '@/components/form-field';

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
  const pid = `${idPrefix}-password`;
  const cid = `${idPrefix}-confirm`;
  return (
    <>
      <FormField id={pid} label="New password" hint={hint} error={errors.password}>
        <input
          id={pid}
          type="password"
          autoComplete="new-password"
          required
          value={value.password}
          onChange={(e) => onChange({ ...value, password: e.target.value })}
          className={inputClass}
          aria-invalid={!!errors.password}
          aria-describedby={describedBy(pid, { error: errors.password, hint })}
        />
      </FormField>
      <FormField id={cid} label="New password again" error={errors.confirm}>
        <input
          id={cid}
          type="password"
          autoComplete="new-password"
          required
          value={value.confirm}
          onChange={(e) => onChange({ ...value, confirm: e.target.value })}
          className={inputClass}
          aria-invalid={!!errors.confirm}
          aria-describedby={describedBy(cid, { error: errors.confirm })}
        />
      </FormField>
    </>
  );
}
