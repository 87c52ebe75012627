import type { ReactNode, SelectHTMLAttributes } from 'react';
import { FormControl } from './FormControl';
import { input } from './styles';

type Props = SelectHTMLAttributes<HTMLSelectElement> & {
  label: string;
  hint?: ReactNode;
  error?: string | null;
};

/** A labelled choice with its hint and error read out by screen readers. */
export function Select({ label, hint, error, id, className, children, ...rest }: Props) {
  return (
    <FormControl id={id} label={label} hint={hint} error={error} className={className}>
      {(control) => (
        <select className={input} {...control} {...rest}>
          {children}
        </select>
      )}
    </FormControl>
  );
}
