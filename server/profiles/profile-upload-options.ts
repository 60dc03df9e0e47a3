/**
 * The multipart fields beside an upload's file, read for the site they go to:
 * a price unit may name the site's currency (e.g. EUR/MWh on a EUR site).
 * Option errors take the same `{line, message}` shape as file errors (line 0 =
 * the form), so one table shows both.
 */
import { profileNameSchema } from '@shared/schemas/profile';
import { profileUploadOptionsSchemaFor, type ProfileUploadOptions } from '@shared/schemas/profile-upload';
import { AppError } from '../http/app-error';

export function parseUploadFields(body: unknown, currency: string): ProfileUploadOptions & { name?: string | undefined } {
  const options = profileUploadOptionsSchemaFor(currency).safeParse(body);
  const name = profileNameSchema.safeParse(body);
  if (options.success && name.success) return { ...options.data, name: name.data.name };
  const issues = [...(options.error?.issues ?? []), ...(name.error?.issues ?? [])].map((i) => ({
    line: 0,
    path: i.path.join('.'),
    message: `${i.path.join('.') || 'form'}: ${i.message}`,
  }));
  throw new AppError('invalid_upload', 'The upload options are invalid: see issues.', 422, issues, {
    hint: 'Nothing was stored. Choose a kind (price, load or generation) and a unit that fits it, then upload again.',
  });
}
