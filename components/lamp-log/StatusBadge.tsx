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
    <span className={`status-badge ${STATUS_STYLE[status]}`}>
      <span aria-hidden="true">{ICON[status]}</span>
      {label}
    </span>
  );
}
