import type { InputHTMLAttributes, ReactNode } from 'react';
import { FormControl } from './FormControl';
import { input } from './styles';

type Props = InputHTMLAttributes<HTMLInputElement> & {
  label: string;
  hint?: ReactNode;
  error?: string | null;
};

/** A labelled input with its hint and error read out by screen readers. */
export function Field({ label, hint, error, id, className, ...rest }: Props) {
  return (
    <FormControl id={id} label={label} hint={hint} error={error} className={className}>
      {(control) => <input className={input} {...control} {...rest} />}
    </FormControl>
  );
}
