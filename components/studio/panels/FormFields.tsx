'use client';
// Inspector inputs. Numbers are stored in cm / °C / fractions and shown in the user's units; an
// edit is applied (one undo step) on Enter or when leaving the field, after validation.
import { useId, useState, type ReactNode } from 'react';
import {
  cmToDisplay,
  cToDisplay,
  displayToC,
  displayToCm,
  formatNumber,
  lengthLabel,
  tempLabel,
} from '@/shared/units';
import { parseTyped, type Check, type DisplayUnits, type FieldKind } from './validate';
import { focusRing } from './CommandButton';

export function toDisplay(v: number, kind: FieldKind, u: DisplayUnits): number {
  if (kind === 'length') return cmToDisplay(v, u.length);
  if (kind === 'temp') return cToDisplay(v, u.temp);
  if (kind === 'percent') return v * 100;
  return v;
}

export function fromDisplay(v: number, kind: FieldKind, u: DisplayUnits): number {
  if (kind === 'length') return displayToCm(v, u.length);
  if (kind === 'temp') return displayToC(v, u.temp);
  if (kind === 'percent') return v / 100;
  return v;
}

function decimals(kind: FieldKind, u: DisplayUnits): number {
  if (kind === 'length') return u.length === 'cm' ? 2 : 3;
  if (kind === 'temp' || kind === 'percent') return 1;
  return 4;
}

export function unitText(kind: FieldKind, u: DisplayUnits, plainUnit?: string): string {
  if (kind === 'length') return lengthLabel(u.length);
  if (kind === 'temp') return tempLabel(u.temp);
  if (kind === 'percent') return '%';
  return plainUnit ?? '';
}

export const inputClass = `h-8 w-full rounded-md border border-basalt-300 bg-white px-2 text-sm tabular-nums text-basalt-900 aria-[invalid=true]:border-ember-600 ${focusRing}`;

/** One inspector control under its label; `control` gets the id the label points at. */
function Labelled({ label, control }: { label: ReactNode; control: (id: string) => ReactNode }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-0.5">
      <label htmlFor={id} className="text-caption font-medium text-basalt-700">
        {label}
      </label>
      {control(id)}
    </div>
  );
}

export function NumberField({
  label,
  value,
  fallback,
  kind,
  units,
  plainUnit,
  optional = false,
  hint,
  testId,
  check,
  onCommit,
}: {
  label: string;
  /** Stored value; undefined = not set (the default applies). */
  value: number | undefined;
  /** The default shown when not set. */
  fallback?: number;
  kind: FieldKind;
  units: DisplayUnits;
  plainUnit?: string;
  optional?: boolean;
  hint?: string;
  testId?: string;
  /** Validates a stored value (undefined = reset to default). */
  check: (stored: number | undefined) => Check<unknown>;
  onCommit: (stored: number | undefined) => void;
}) {
  const shown = value === undefined ? '' : formatNumber(toDisplay(value, kind, units), decimals(kind, units));
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  // Follow outside changes (dragging on the canvas, undo, a unit switch): adjust during render.
  const [prevShown, setPrevShown] = useState(shown);
  if (prevShown !== shown) {
    setPrevShown(shown);
    setText(shown);
    setError(null);
  }

  const commit = () => {
    if (text.trim() === shown) {
      setError(null);
      return;
    }
    const n = parseTyped(text);
    if (n === null && !optional) {
      setError('Enter a number.');
      return;
    }
    if (n !== null && Number.isNaN(n)) {
      setError('Enter a number, e.g. 12.5.');
      return;
    }
    const stored = n === null ? undefined : fromDisplay(n, kind, units);
    const r = check(stored);
    if (!r.ok) {
      setError(r.message);
      return;
    }
    setError(null);
    onCommit(stored);
  };

  const placeholder =
    fallback === undefined
      ? ''
      : `${formatNumber(toDisplay(fallback, kind, units), decimals(kind, units))} (default)`;
  const unit = unitText(kind, units, plainUnit);
  const control = (id: string) => (
    <>
      <div className="flex items-center gap-1">
        <input
          id={id}
          data-testid={testId}
          inputMode="decimal"
          autoComplete="off"
          className={inputClass}
          value={text}
          placeholder={placeholder}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-err` : hint ? `${id}-hint` : undefined}
          onChange={(e) => setText(e.target.value)}
          onBlur={commit}
          onKeyDown={(e) => {
            if (e.key === 'Enter') {
              e.preventDefault();
              commit();
            } else if (e.key === 'Escape') {
              setText(shown);
              setError(null);
            }
          }}
        />
        {optional && value !== undefined && fallback !== undefined && (
          <button
            type="button"
            title="Back to the preset value"
            aria-label={`Reset ${label} to the default`}
            className={`h-8 shrink-0 rounded-md px-1.5 text-caption text-basalt-600 hover:bg-basalt-100 ${focusRing}`}
            onClick={() => {
              setError(null);
              onCommit(undefined);
            }}
          >
            ↺
          </button>
        )}
      </div>
      {error ? (
        <p id={`${id}-err`} role="alert" className="text-caption text-ember-700">
          {error}
        </p>
      ) : hint ? (
        <p id={`${id}-hint`} className="text-caption text-basalt-500">
          {hint}
        </p>
      ) : null}
    </>
  );
  return (
    <Labelled
      label={
        <>
          {label}
          {unit && <span className="font-normal text-basalt-500"> ({unit})</span>}
        </>
      }
      control={control}
    />
  );
}

export function TextField({
  label,
  value,
  placeholder,
  maxLength = 200,
  onCommit,
}: {
  label: string;
  value: string | undefined;
  placeholder?: string;
  maxLength?: number;
  onCommit: (v: string | undefined) => void;
}) {
  const [text, setText] = useState(value ?? '');
  const [prev, setPrev] = useState(value);
  if (prev !== value) {
    setPrev(value);
    setText(value ?? '');
  }
  const commit = () => {
    const t = text.trim().slice(0, maxLength);
    if ((t || undefined) !== value) onCommit(t || undefined);
  };
  return (
    <Labelled
      label={label}
      control={(id) => (
        <input
          id={id}
          className={inputClass}
          value={text}
          maxLength={maxLength}
          placeholder={placeholder}
          onChange={(e) => setText(e.target.value)}
          onBlur={commit}
          onKeyDown={(e) => {
            if (e.key === 'Enter') commit();
          }}
        />
      )}
    />
  );
}

export function SelectField<T extends string>({
  label,
  value,
  options,
  onChange,
  testId,
}: {
  label: string;
  value: T | '';
  options: { value: T | ''; label: string; disabled?: boolean }[];
  onChange: (v: T) => void;
  testId?: string;
}) {
  return (
    <Labelled
      label={label}
      control={(id) => (
        <select
          id={id}
          data-testid={testId}
          className={inputClass}
          value={value}
          onChange={(e) => onChange(e.target.value as T)}
        >
          {options.map((o) => (
            <option key={o.value || '_none'} value={o.value} disabled={o.disabled}>
              {o.label}
            </option>
          ))}
        </select>
      )}
    />
  );
}

/** An opacity as a slider of whole percent in steps of 5, the value read out in its label. */
export function OpacitySlider({
  label,
  value,
  min,
  testId,
  disabled,
  onChange,
  onSlideStart,
  onSlideEnd,
}: {
  label: string;
  /** 0–1 */
  value: number;
  /** The lowest percent it goes down to. */
  min: number;
  testId?: string;
  disabled?: boolean;
  onChange: (value: number) => void;
  onSlideStart?: () => void;
  onSlideEnd?: () => void;
}) {
  const id = useId();
  const percent = Math.round(value * 100);
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-caption font-medium text-basalt-700">
        {label} {percent} %
      </label>
      <input
        id={id}
        data-testid={testId}
        type="range"
        min={min}
        max={100}
        step={5}
        disabled={disabled}
        value={percent}
        onPointerDown={onSlideStart}
        onPointerUp={onSlideEnd}
        onPointerCancel={onSlideEnd}
        onBlur={onSlideEnd}
        onChange={(e) => onChange(Number(e.target.value) / 100)}
        className={`accent-moss-600 ${focusRing}`}
      />
    </div>
  );
}

export function Section({
  title,
  children,
  actions,
}: {
  title: string;
  children: ReactNode;
  actions?: ReactNode;
}) {
  return (
    <section className="flex flex-col gap-2 border-b border-basalt-100 px-3 py-3" aria-label={title}>
      <div className="flex items-center justify-between">
        <h3 className="text-sm font-semibold text-basalt-900">{title}</h3>
        {actions}
      </div>
      {children}
    </section>
  );
}

export function Grid2({ children }: { children: ReactNode }) {
  return <div className="grid grid-cols-2 gap-2">{children}</div>;
}
