import { useId, type SelectHTMLAttributes } from 'react';
import { input } from './styles';

type Props = SelectHTMLAttributes<HTMLSelectElement> & { label: string; error?: string | null };

export function Select({ label, error, id, className, children, ...rest }: Props) {
  const auto = useId();
  const selectId = id ?? auto;
  return (
    <div className={className}>
      <label htmlFor={selectId} className="mb-1 block text-body font-medium text-basalt-800">
        {label}
      </label>
      <select
        id={selectId}
        className={input}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${selectId}-error` : undefined}
        {...rest}
      >
        {children}
      </select>
      {error && (
        <p id={`${selectId}-error`} className="mt-1 text-caption font-medium text-ember-700">
          {error}
        </p>
      )}
    </div>
  );
}
