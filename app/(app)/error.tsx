'use client';

import { ErrorPanel, type ErrorBoundaryProps } from '@/components/shell/ErrorPanel';

export default function AppError({ error, reset }: ErrorBoundaryProps) {
  return <ErrorPanel error={error} reset={reset} />;
}
