import type { ReactNode, TextareaHTMLAttributes } from 'react';
import { FormControl } from './FormControl';
import { input } from './styles';

type Props = TextareaHTMLAttributes<HTMLTextAreaElement> & {
  label: string;
  error?: string | null;
  hint?: ReactNode;
  hideLabel?: boolean;
};

/** A labelled text area with its hint and error read out by screen readers. */
export function TextArea({ label, error, hint, hideLabel, id, className, ...rest }: Props) {
  return (
    <FormControl id={id} label={label} hint={hint} error={error} hideLabel={hideLabel} className={className}>
      {(control) => <textarea className={input} {...control} {...rest} />}
    </FormControl>
  );
}
