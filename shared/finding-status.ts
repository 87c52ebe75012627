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
