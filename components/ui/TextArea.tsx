import { useId, type TextareaHTMLAttributes } from 'react';
import { input } from './styles';

type Props = TextareaHTMLAttributes<HTMLTextAreaElement> & {
  label: string;
  error?: string | null;
  hint?: string;
};

export function TextArea({ label, error, hint, id, className, ...rest }: Props) {
  const auto = useId();
  const areaId = id ?? auto;
  const describedBy = [hint ? `${areaId}-hint` : '', error ? `${areaId}-error` : '']
    .filter(Boolean)
    .join(' ');
  return (
    <div className={className}>
      <label htmlFor={areaId} className="mb-1 block text-body font-medium text-basalt-800">
        {label}
      </label>
      <textarea
        id={areaId}
        className={input}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy || undefined}
        {...rest}
      />
      {hint && (
        <p id={`${areaId}-hint`} className="mt-1 text-caption text-basalt-500">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${areaId}-error`} className="mt-1 text-caption font-medium text-ember-700">
          {error}
        </p>
      )}
    </div>
  );
}
