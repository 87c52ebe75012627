// How a finding's state reads everywhere — the studio, the species check on compare and share pages,
// and the PDF report: one word and one mark per state.
import type { FindingStatus } from '@/simulation';

export const FINDING_STATUS: Record<
  FindingStatus,
  { word: string; mark: string; rgb: [number, number, number] }
> = {
  pass: { word: 'Pass', mark: '✓', rgb: [0.18, 0.42, 0.21] },
  attention: { word: 'Attention', mark: '!', rgb: [0.71, 0.45, 0.13] },
  fail: { word: 'Fail', mark: '✕', rgb: [0.65, 0.19, 0.12] },
};

const SEVERITY: Record<FindingStatus, number> = { fail: 0, attention: 1, pass: 2 };

/**
 * Findings with what needs doing first: fails, then attentions, then passes, each group in the engine's
 * order. A list that opens on passes hides the one failing verdict below the fold.
 */
export function worstFirst<T extends { status: FindingStatus }>(findings: readonly T[]): T[] {
  return findings
    .map((f, i) => ({ f, i }))
    .sort((a, b) => SEVERITY[a.f.status] - SEVERITY[b.f.status] || a.i - b.i)
    .map(({ f }) => f);
}
