import type { ReactNode } from 'react';

/** What an empty area will hold and what to do about it — never a blank box. */
export function EmptyState({
  title,
  children,
  action,
}: {
  title: string;
  children: ReactNode;
  action?: ReactNode;
}) {
  return (
    <div className="rounded-lg border border-dashed border-basalt-300 bg-basalt-50 px-6 py-10 text-center">
      <h2 className="text-lead font-semibold text-basalt-900">{title}</h2>
      <div className="mx-auto mt-2 max-w-prose space-y-2 text-body text-basalt-600">{children}</div>
      {action && <div className="mt-5 flex justify-center">{action}</div>}
    </div>
  );
}
