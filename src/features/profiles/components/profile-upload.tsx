import { useState, type FormEvent } from 'react';
import { useDropzone, type FileRejection } from 'react-dropzone';
import { Link } from 'react-router-dom';
import { ACCEPTED_UNITS, PROFILE_KINDS, type ProfileKind } from '@shared/profile-csv';
import { MAX_PROFILE_UPLOAD_BYTES } from '@shared/schemas/profile';
import { FormField, buttonClass, inputClass } from '@/components/form-field';
import { ApiError } from '@/lib/api-client';
import { useProfilePreview } from '../hooks/use-profile-preview';
import { useUploadProfile } from '../api/upload-profile';
import { UploadIssuesTable } from './upload-issues-table';
import { UploadPreview } from './upload-preview';

const KIND_LABELS: Record<ProfileKind, string> = { price: 'Price', load: 'Site load', generation: 'Generation' };
const ACCEPT = { 'text/csv': ['.csv'], 'text/plain': ['.txt', '.csv'], 'application/vnd.ms-excel': ['.csv'] };

export interface ProfileUploadProps {
  siteId: string;
  timezone: string;
  currency: string;
}

/** Drop or pick a CSV, choose kind and unit, check the browser preview, then send it; the server's verdict is shown as a table of lines. */
export function ProfileUpload({ siteId, timezone, currency }: ProfileUploadProps) {
  const [file, setFile] = useState<File | null>(null);
  const [rejection, setRejection] = useState<string | null>(null);
  const [kind, setKind] = useState<ProfileKind>('price');
  const [unit, setUnit] = useState<string>(ACCEPTED_UNITS.price[0] ?? 'currency/MWh');
  const [name, setName] = useState('');
  const [intervalEnding, setIntervalEnding] = useState(false);
  const [fillGaps, setFillGaps] = useState(false);
  const upload = useUploadProfile();
  const preview = useProfilePreview(file, { kind, unit, intervalEnding, fillGaps }, timezone);

  const onDrop = (accepted: File[], rejected: FileRejection[]) => {
    upload.reset();
    setRejection(rejected[0] ? `${rejected[0].file.name}: ${rejected[0].errors.map((e) => e.message).join('; ')}` : null);
    setFile(accepted[0] ?? null);
  };
  const dropzone = useDropzone({
    onDrop,
    accept: ACCEPT,
    multiple: false,
    maxSize: MAX_PROFILE_UPLOAD_BYTES,
    getErrorMessage: (error) =>
      error.code === 'file-too-large'
        ? 'the file is larger than 20 MB'
        : error.code === 'file-invalid-type'
          ? 'only .csv or .txt files are accepted'
          : error.message,
  });

  const chooseKind = (next: ProfileKind) => {
    setKind(next);
    setUnit(ACCEPTED_UNITS[next][0] ?? '');
  };
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!file) return;
    // A stored file is cleared from the form, so a second press cannot store it twice.
    upload.mutate(
      { siteId, file, kind, unit, name: name.trim(), intervalEnding, fillGaps },
      {
        onSuccess: () => {
          setFile(null);
          setName('');
        },
      },
    );
  };
  const serverError = upload.error instanceof ApiError ? upload.error : null;
  const hint = typeof serverError?.body.hint === 'string' ? serverError.body.hint : undefined;

  return (
    <form onSubmit={submit} className="space-y-4" aria-label="Upload a profile">
      <div
        {...dropzone.getRootProps({
          className: `flex cursor-pointer flex-col items-center justify-center rounded border-2 border-dashed p-6 text-center ${dropzone.isDragActive ? 'border-seaglass-600 bg-seaglass-100' : 'border-ink-300 bg-white'}`,
        })}
      >
        <input {...dropzone.getInputProps({ 'aria-label': 'CSV file' })} />
        <p className="font-medium text-ink-800">{file ? file.name : 'Drop a CSV file here, or press to choose one'}</p>
        <p className="text-sm text-ink-500">
          A header row, a time column and a value column; comma or semicolon; up to 20 MB.
          {file ? ` ${(file.size / 1024).toFixed(1)} kB chosen.` : ''}
        </p>
      </div>
      {rejection && (
        <p role="alert" className="text-sm text-brick-700">
          {rejection}
        </p>
      )}

      <div className="grid gap-4 sm:grid-cols-3">
        <FormField id="profile-kind" label="Kind">
          <select
            id="profile-kind"
            className={inputClass}
            value={kind}
            onChange={(e) => chooseKind(e.target.value as ProfileKind)}
          >
            {PROFILE_KINDS.map((k) => (
              <option key={k} value={k}>
                {KIND_LABELS[k]}
              </option>
            ))}
          </select>
        </FormField>
        <FormField
          id="profile-unit"
          label="Unit in the file"
          hint={kind === 'price' ? undefined : 'kWh or MWh = energy per interval, stored as average kW.'}
        >
          <select id="profile-unit" className={inputClass} value={unit} onChange={(e) => setUnit(e.target.value)}>
            {ACCEPTED_UNITS[kind].map((u) => (
              <option key={u} value={u}>
                {u.replace('currency', currency)}
              </option>
            ))}
          </select>
        </FormField>
        <FormField id="profile-name" label="Name (optional)" hint="Defaults to the file name.">
          <input
            id="profile-name"
            className={inputClass}
            value={name}
            maxLength={120}
            onChange={(e) => setName(e.target.value)}
          />
        </FormField>
      </div>
      <div className="flex flex-wrap gap-6 text-sm">
        <label className="flex items-center gap-2">
          <input type="checkbox" checked={intervalEnding} onChange={(e) => setIntervalEnding(e.target.checked)} />
          Times mark the end of each interval
        </label>
        <label className="flex items-center gap-2">
          <input type="checkbox" checked={fillGaps} onChange={(e) => setFillGaps(e.target.checked)} />
          Fill missing intervals by interpolation (they are listed and marked)
        </label>
      </div>

      <UploadPreview state={preview} timezone={timezone} currency={currency} />

      <button type="submit" className={buttonClass.primary} disabled={!file || upload.isPending}>
        {upload.isPending ? 'Uploading…' : 'Upload profile'}
      </button>
      {upload.isSuccess && (
        <p role="status" className="rounded bg-seaglass-100 px-3 py-2">
          Stored “{upload.data.name}”: {upload.data.valueCount.toLocaleString()} intervals.{' '}
          <Link className="font-medium text-seaglass-700 underline" to={`/profiles/${upload.data.id}`}>
            Open it
          </Link>
        </p>
      )}
      {upload.isError &&
        (serverError && serverError.issues.length > 0 ? (
          <UploadIssuesTable
            title={`The server refused the file: ${serverError.message}`}
            issues={serverError.issues}
            hint={hint}
          />
        ) : (
          <p role="alert" className="text-brick-700">
            {upload.error.message}
          </p>
        ))}
    </form>
  );
}
