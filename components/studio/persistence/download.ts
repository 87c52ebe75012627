// Hands the person their design as a design file (the same JSON as the variant download), e.g. the
// unsaved work of a studio whose saves the server refuses. Browser only.
import { fileStem } from '@/lib/files/file-name';
import type { Design } from '../state/types';

/** A file name from a title: letters, digits and dashes only. */
export function designFileName(title: string, suffix: string): string {
  return `${fileStem(title, 'design', 80)}-${suffix}.baskwell.json`;
}

export function downloadDesign(design: Design, fileName: string) {
  const blob = new Blob([`${JSON.stringify(design, null, 2)}\n`], { type: 'application/json' });
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.rel = 'noopener';
  document.body.appendChild(a);
  a.click();
  a.remove();
  // Released once the browser has surely read it (revoking at once can cancel the download).
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}
