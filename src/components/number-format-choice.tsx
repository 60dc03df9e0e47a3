import type { DecimalSeparator } from '@shared/numbers';
import { setDecimalSeparator, useDecimalSeparator } from '@/lib/number-format';
import { compactSelect } from './form-field';

const CHOICES: { value: DecimalSeparator; label: string }[] = [
  { value: '.', label: '1,234.5 (decimal point)' },
  { value: ',', label: '1.234,5 (decimal comma)' },
];

/**
 * Which number format the form reads, and the place to change it: numbers typed in
 * another format are refused with a message, never guessed. Changing it redraws the
 * page (every number shown follows it too), so choose it before typing.
 */
export function NumberFormatChoice({ id }: { id: string }) {
  const decimal = useDecimalSeparator();
  return (
    <p className="flex flex-wrap items-center gap-2 text-sm text-ink-700">
      <label htmlFor={id}>Numbers are read in the format</label>
      <select
        id={id}
        className={compactSelect}
        value={decimal}
        onChange={(e) => setDecimalSeparator(e.target.value === ',' ? ',' : '.')}
      >
        {CHOICES.map((c) => (
          <option key={c.value} value={c.value}>
            {c.label}
          </option>
        ))}
      </select>
    </p>
  );
}
