// File names for downloads, shared by the server's exports and the studio's own design-file download.
// Pure: no Node or browser APIs.

/** A file-name stem from a name: lower-case letters, digits and single dashes, at most `maxLength` long. */
export function fileStem(name: string, fallback: string, maxLength = 60): string {
  const stem = name
    .normalize('NFKD')
    .replace(/[^\w\s-]/g, '')
    .trim()
    .replace(/[\s_]+/g, '-')
    .replace(/-+/g, '-')
    .toLowerCase()
    .slice(0, maxLength);
  return stem || fallback;
}
