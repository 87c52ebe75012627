import type { Status } from '@/lib/lamp-log/outlook';
import { STATUS_STYLE } from './format';

/** Our status labels, with a shape cue besides the colour (never colour alone). */
const ICON: Record<Status, string> = {
  replace: '▲',
  'test-soon': '●',
  fine: '✓',
  'heat-only': '–',
  retired: '–',
};

export function StatusBadge({ status, label }: { status: Status; label: string }) {
  return (
    <span
      className={`inline-flex items-center gap-1 whitespace-nowrap rounded-full px-2 py-0.5 text-caption font-semibold ring-1 ring-inset ${STATUS_STYLE[status]}`}
    >
      <span aria-hidden="true">{ICON[status]}</span>
      {label}
    </span>
  );
}
