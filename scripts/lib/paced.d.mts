export function percentile(sorted: number[], q: number): number;

export function runFigures(r: unknown): {
  requests: number;
  rps: number;
  p50: number;
  p99: number;
  codes: Record<string, number>;
};

export interface PacedFigures {
  requests: number;
  seconds: number;
  rps: number;
  p50: number;
  p99: number;
  max: number;
  codes: Record<string, number>;
  bytes: number;
  errors: number;
  timeouts: number;
}

export function paced(opts: {
  url: string;
  headers?: Record<string, string>;
  rate: number;
  duration: number;
  timeout?: number;
}): Promise<PacedFigures>;

export function bursts(opts: {
  url: string;
  headers?: Record<string, string>;
  rate: number;
  duration: number;
  connections?: number;
  timeout?: number;
}): Promise<PacedFigures>;
