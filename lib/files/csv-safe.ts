/**
 * Spreadsheet programs run a cell that starts with `=`, `+`, `-` or `@` (or a tab or carriage return,
 * which some of them skip first) as a formula — "CSV injection" (OWASP). Every CSV the app hands out goes
 * through here: such a cell gets a leading apostrophe, which spreadsheets show as text, and is quoted.
 * Plain numbers (`-3.5`, `+2`) are not formulas and stay as they are, so figures still read as figures.
 * The rest of the file — other cells, quoting, line ends — is kept byte for byte.
 */
const TRIGGER = /^[=+\-@\t\r]/;
const NUMBER = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/;

export function neutraliseCell(value: string): string {
  return TRIGGER.test(value) && !NUMBER.test(value) ? `'${value}` : value;
}

const quote = (v: string) => `"${v.replaceAll('"', '""')}"`;

/** One cell for a CSV being written: neutralised, and quoted when it needs to be. */
export function csvCell(value: string | number | null | undefined): string {
  const text = neutraliseCell(value === null || value === undefined ? '' : String(value));
  return /[",\r\n;]/.test(text) || text !== String(value ?? '') ? quote(text) : text;
}

/** Rewrites the cells of a CSV text that a spreadsheet would run; separators `,`, `;` or tab. */
export function neutraliseCsv(text: string): string {
  let out = '';
  let i = 0;
  const n = text.length;
  while (i <= n) {
    // One cell starts at i.
    let raw: string;
    let value: string;
    if (text[i] === '"') {
      let j = i + 1;
      value = '';
      for (;;) {
        if (j >= n) break;
        if (text[j] === '"') {
          if (text[j + 1] === '"') {
            value += '"';
            j += 2;
            continue;
          }
          j++;
          break;
        }
        value += text[j];
        j++;
      }
      // Anything between the closing quote and the separator belongs to the cell as written.
      let k = j;
      while (k < n && !isEnd(text, k)) k++;
      value += text.slice(j, k);
      raw = text.slice(i, k);
      i = k;
    } else {
      let k = i;
      while (k < n && !isEnd(text, k)) k++;
      raw = text.slice(i, k);
      value = raw;
      i = k;
    }
    out += neutraliseCell(value) === value ? raw : quote(neutraliseCell(value));
    if (i >= n) break;
    // The separator or line end itself.
    if (text[i] === '\r' && text[i + 1] === '\n') {
      out += '\r\n';
      i += 2;
    } else {
      out += text[i];
      i++;
    }
    if (i === n) break;
  }
  return out;
}

function isEnd(text: string, k: number): boolean {
  const c = text[k];
  return c === ',' || c === ';' || c === '\t' || c === '\n' || c === '\r';
}
