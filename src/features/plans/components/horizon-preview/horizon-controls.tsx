/**
 * The horizon as a slider (drag or arrow keys) with the value in hours beside
 * it, and the same value as a number to type, for horizons past the slider's
 * week or when a slider is hard to use. Typed values count once they are
 * valid; until then the field says what is wrong.
 */
import { useState } from 'react';
import { describedBy, inputClass } from '@/components/form-field';
import { numberText, readNumberInput } from '@/lib/form-values';
import { formatNumber } from '@/lib/format';

export interface HorizonRange {
  min: number;
  /** The slider's end; typed values may go up to maxHours. */
  sliderMax: number;
  sliderStep: number;
  maxHours: number;
  /** Horizons are whole multiples of the profiles' step. */
  stepHours: number;
}

function problemWith(text: string, r: HorizonRange): string | null {
  const { value: hours, error } = readNumberInput(text);
  if (error) return error;
  if (hours === null || !Number.isFinite(hours)) return 'Enter the horizon in hours, e.g. 48.';
  if (hours < r.min - 1e-9) return `At least ${formatNumber(r.min, 2)} h: the horizon must cover the delivery window.`;
  if (hours > r.maxHours + 1e-9)
    return `At most ${formatNumber(r.maxHours, 2)} h for a preview; make a full plan for a longer one.`;
  const steps = hours / r.stepHours;
  if (Math.abs(steps - Math.round(steps)) > 1e-9)
    return `Use a multiple of ${formatNumber(r.stepHours * 60, 0)} minutes, the profiles’ step.`;
  return null;
}

export function HorizonControls({
  hours,
  range,
  onChange,
}: {
  hours: number;
  range: HorizonRange;
  onChange: (hours: number) => void;
}) {
  // What is typed, while it differs from the value in use (null: show the value).
  const [draft, setDraft] = useState<string | null>(null);
  const problem = draft === null ? null : problemWith(draft, range);
  return (
    <div className="grid gap-4 sm:grid-cols-[3fr_1fr] sm:items-end">
      <div className="flex flex-col gap-1">
        <label htmlFor="preview-horizon-range" className="text-sm font-medium text-ink-800">
          Horizon
        </label>
        <div className="flex items-center gap-3">
          <input
            id="preview-horizon-range"
            type="range"
            className="w-full accent-seaglass-700"
            min={range.min}
            max={range.sliderMax}
            step={range.sliderStep}
            value={Math.min(hours, range.sliderMax)}
            aria-valuetext={`${formatNumber(hours, 2)} hours`}
            onChange={(e) => {
              setDraft(null);
              onChange(Number(e.target.value));
            }}
          />
          <output htmlFor="preview-horizon-range" className="w-16 shrink-0 text-right font-semibold tabular-nums text-ink-900">
            {formatNumber(hours, 2)} h
          </output>
        </div>
        <p className="flex justify-between text-xs text-ink-500" aria-hidden="true">
          <span>{formatNumber(range.min, 2)} h (the delivery window)</span>
          <span>{formatNumber(range.sliderMax, 2)} h</span>
        </p>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor="preview-horizon-hours" className="text-sm font-medium text-ink-800">
          Horizon in hours
        </label>
        {/* Text, not type=number: the browser's own number field reads the browser's language, not the chosen format. */}
        <input
          id="preview-horizon-hours"
          inputMode="decimal"
          className={inputClass}
          value={draft ?? numberText(hours)}
          aria-invalid={problem !== null}
          aria-describedby={describedBy('preview-horizon-hours', { error: problem ?? undefined })}
          onChange={(e) => {
            setDraft(e.target.value);
            const typed = readNumberInput(e.target.value).value;
            if (problemWith(e.target.value, range) === null && typed !== null) onChange(typed);
          }}
          onBlur={() => problem === null && setDraft(null)}
        />
        {problem && (
          <p id="preview-horizon-hours-error" role="alert" className="text-sm text-brick-700">
            {problem}
          </p>
        )}
      </div>
    </div>
  );
}
