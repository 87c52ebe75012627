import type { ReactNode } from 'react';

const tones = {
  info: 'border-sky-200 bg-sky-50 text-sky-900',
  success: 'border-moss-200 bg-moss-50 text-moss-900',
  warning: 'border-sand-300 bg-sand-50 text-sand-900',
  error: 'border-ember-200 bg-ember-50 text-ember-900',
};

/** A boxed message. Errors are announced at once (role=alert); the rest politely. */
export function Notice({
  tone = 'info',
  title,
  children,
}: {
  tone?: keyof typeof tones;
  title?: string;
  children?: ReactNode;
}) {
  return (
    <div
      role={tone === 'error' ? 'alert' : 'status'}
      className={`rounded-md border px-4 py-3 text-body ${tones[tone]}`}
    >
      {title && <p className="font-semibold">{title}</p>}
      {children && <div className={title ? 'mt-1' : undefined}>{children}</div>}
    </div>
  );
}
