import { useId, type InputHTMLAttributes, type ReactNode } from 'react';
import { input } from './styles';

type Props = InputHTMLAttributes<HTMLInputElement> & {
  label: string;
  hint?: ReactNode;
  error?: string | null;
};

/** A labelled input with its hint and error read out by screen readers. */
export function Field({ label, hint, error, id, className, ...rest }: Props) {
  const auto = useId();
  const inputId = id ?? auto;
  const hintId = hint ? `${inputId}-hint` : undefined;
  const errorId = error ? `${inputId}-error` : undefined;
  return (
    <div className={className}>
      <label htmlFor={inputId} className="mb-1 block text-body font-medium text-basalt-800">
        {label}
      </label>
      <input
        id={inputId}
        className={input}
        aria-invalid={error ? true : undefined}
        aria-describedby={[hintId, errorId].filter(Boolean).join(' ') || undefined}
        {...rest}
      />
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
