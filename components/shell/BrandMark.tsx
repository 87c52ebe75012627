import Link from '@/components/ui/Link';
import { focusRing } from '@/components/ui/styles';

/** The word mark: a small sun over a ledge, and the name. */
export function BrandMark({ href = '/', inverted = false }: { href?: string; inverted?: boolean }) {
  return (
    <Link href={href} className={`inline-flex items-center gap-2 rounded ${focusRing}`}>
      <svg viewBox="0 0 32 32" width="28" height="28" aria-hidden="true">
        <circle cx="16" cy="12" r="6" className="fill-sand-400" />
        <path d="M4 26h24" className="stroke-moss-500" strokeWidth="4" strokeLinecap="round" />
      </svg>
      <span className={`text-lead font-bold tracking-tight ${inverted ? 'text-white' : 'text-basalt-900'}`}>
        Baskwell
      </span>
    </Link>
  );
}
