import { useState, type FormEvent } from 'react';
import { useDropzone, type FileRejection } from 'react-dropzone';
import { Link } from 'react-router-dom';
import { ACCEPTED_UNITS, PROFILE_KINDS, type DateOrder, type DecimalSeparator, type ProfileKind } from '@shared/profile-csv';
import { MAX_PROFILE_UPLOAD_BYTES } from '@shared/schemas/profile';
import { FormField, buttonClass, inputClass } from '@/components/form-field';
import { ApiError } from '@/lib/api-client';
import { formatCount, formatNumber } from '@/lib/format';
import { useProfilePreview } from '../hooks/use-profile-preview';
import { useUploadProfile } from '../api/upload-profile';
import { UploadIssuesTable } from './upload-issues-table';
import { UploadPreview } from './upload-preview';

const KIND_LABELS: Record<ProfileKind, string> = { price: 'Price', load: 'Site load', generation: 'Generation' };
const DATE_ORDERS: { value: DateOrder | ''; label: string }[] = [
  { value: '', label: 'ISO 8601 only (2026-12-08 00:00)' },
  { value: 'dmy', label: 'Day first: 08.12.2026 00:00 is 8 December' },
  { value: 'mdy', label: 'Month first: 12/08/2026 00:00 is 8 December' },
];
const DECIMAL_SEPARATORS: { value: DecimalSeparator | ''; label: string }[] = [
  { value: '', label: 'Plain: 12.5 (12,5 in a ; file)' },
  { value: '.', label: 'Point, commas between thousands: 1,010.25' },
  { value: ',', label: 'Comma, points between thousands: 1.010,25' },
];

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
  const [dateOrder, setDateOrder] = useState<DateOrder | ''>('');
  const [decimalSeparator, setDecimalSeparator] = useState<DecimalSeparator | ''>('');
  const upload = useUploadProfile();
  const declared = { dateOrder: dateOrder || undefined, decimalSeparator: decimalSeparator || undefined };
  const preview = useProfilePreview(file, { kind, unit, intervalEnding, fillGaps, ...declared }, timezone);
  // Another choice makes the server's last answer stale: the preview speaks for the file again.
  const choose =
    <T,>(set: (value: T) => void) =>
    (value: T) => {
      upload.reset();
      set(value);
    };

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
    upload.reset();
    setKind(next);
    setUnit(ACCEPTED_UNITS[next][0] ?? '');
  };
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!file) return;
    // A stored file is cleared from the form, so a second press cannot store it twice.
    upload.mutate(
      { siteId, file, kind, unit, name: name.trim(), intervalEnding, fillGaps, ...declared },
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
  const serverIssues = serverError !== null && serverError.issues.length > 0;

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
          {file ? ` ${formatNumber(file.size / 1024, 1)} kB chosen.` : ''}
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
          <select id="profile-unit" className={inputClass} value={unit} onChange={(e) => choose(setUnit)(e.target.value)}>
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
      <div className="grid gap-4 sm:grid-cols-2">
        <FormField
          id="profile-date-order"
          label="Dates in the file"
          hint="Day-first or month-first dates are read only when chosen here."
        >
          <select
            id="profile-date-order"
            className={inputClass}
            value={dateOrder}
            aria-describedby="profile-date-order-hint"
            onChange={(e) => choose(setDateOrder)(e.target.value as DateOrder | '')}
          >
            {DATE_ORDERS.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </select>
        </FormField>
        <FormField
          id="profile-decimal-separator"
          label="Numbers in the file"
          hint="Thousands separators are read only when the decimal separator is chosen here."
        >
          <select
            id="profile-decimal-separator"
            className={inputClass}
            value={decimalSeparator}
            aria-describedby="profile-decimal-separator-hint"
            onChange={(e) => choose(setDecimalSeparator)(e.target.value as DecimalSeparator | '')}
          >
            {DECIMAL_SEPARATORS.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </select>
        </FormField>
      </div>
      <div className="flex flex-wrap gap-x-6 gap-y-2 text-sm">
        <label className="flex items-center gap-2">
          <input type="checkbox" checked={intervalEnding} onChange={(e) => choose(setIntervalEnding)(e.target.checked)} />
          Times mark the end of each interval
        </label>
        <label className="flex items-center gap-2">
          <input type="checkbox" checked={fillGaps} onChange={(e) => choose(setFillGaps)(e.target.checked)} />
          Fill missing intervals by interpolation (they are listed and marked)
        </label>
      </div>

      {/* Once the server has answered with its list, the preview's list of the same lines is not shown again. */}
      <UploadPreview state={preview} timezone={timezone} currency={currency} hideIssues={serverIssues} />

      <button type="submit" className={buttonClass.primary} disabled={!file || upload.isPending}>
        {upload.isPending ? 'Uploading…' : 'Upload profile'}
      </button>
      {upload.isSuccess && (
        <p role="status" className="rounded bg-seaglass-100 px-3 py-2">
          Stored “{upload.data.name}”: {formatCount(upload.data.valueCount)} intervals.{' '}
          <Link className="font-medium text-seaglass-700 underline" to={`/profiles/${upload.data.id}`}>
            Open it
          </Link>
        </p>
      )}
      {upload.isError &&
        (serverIssues ? (
          <UploadIssuesTable
            title={`The server refused the file: ${serverError.message}`}
            issues={serverError?.issues ?? []}
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
