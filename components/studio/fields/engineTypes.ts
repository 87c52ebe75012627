// The engine's assessment types, as its public API declares them.
export type { Assessment, Finding, FindingStatus, Segment } from '@/simulation';
