import { useId, type ReactNode } from 'react';

/** What a control needs to be tied to its label, hint and error. */
export type ControlProps = {
  id: string;
  'aria-invalid': true | undefined;
  'aria-describedby': string | undefined;
};

/**
 * The frame of every labelled form control (text field, choice, text area): the label, the control, a
 * hint and an error under it, both read out by screen readers with the control. `hideLabel` keeps the
 * label for screen readers only, where a visible heading already names the control.
 */
export function FormControl({
  id,
  label,
  hint,
  error,
  hideLabel = false,
  className,
  children,
}: {
  id?: string;
  label: string;
  hint?: ReactNode;
  error?: string | null;
  hideLabel?: boolean;
  className?: string;
  children: (control: ControlProps) => ReactNode;
}) {
  const auto = useId();
  const controlId = id ?? auto;
  const hintId = hint ? `${controlId}-hint` : undefined;
  const errorId = error ? `${controlId}-error` : undefined;
  return (
    <div className={className}>
      <label
        htmlFor={controlId}
        className={hideLabel ? 'sr-only' : 'mb-1 block text-body font-medium text-basalt-800'}
      >
        {label}
      </label>
      {children({
        id: controlId,
        'aria-invalid': error ? true : undefined,
        'aria-describedby': [hintId, errorId].filter(Boolean).join(' ') || undefined,
      })}
      {hint && (
        <p id={hintId} className="mt-1 text-caption text-basalt-500">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="mt-1 text-caption font-medium text-ember-700">
          {error}
        </p>
      )}
    </div>
  );
}
