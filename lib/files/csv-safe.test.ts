import { describe, expect, it } from 'vitest';
import { csvCell, neutraliseCell, neutraliseCsv } from './csv-safe';

describe('neutraliseCsv', () => {
  it('turns cells a spreadsheet would run into text', () => {
    const csv =
      'taken_at,value,note\n2025-03-01,40,"=HYPERLINK(""http://evil.example"",""x"")"\n2025-03-02,41,@SUM(A1)\n';
    expect(neutraliseCsv(csv)).toBe(
      'taken_at,value,note\n2025-03-01,40,"\'=HYPERLINK(""http://evil.example"",""x"")"\n2025-03-02,41,"\'@SUM(A1)"\n',
    );
  });

  it('catches a formula inside quotes, after a semicolon or tab, and with CRLF line ends', () => {
    expect(neutraliseCsv('a;"+cmd|\' /C calc\'!A0"\r\nb\t-2+3\r\n')).toBe(
      'a;"\'+cmd|\' /C calc\'!A0"\r\nb\t"\'-2+3"\r\n',
    );
  });

  it('keeps plain numbers, dates and ordinary text byte for byte', () => {
    const csv =
      'taken_at,value,unit,distance_cm\n2025-03-01T10:00:00-05:00,-3.5,uvb,30\n"a, b",+2,"x ""y""",1e-3\n';
    expect(neutraliseCsv(csv)).toBe(csv);
  });

  it('leaves no cell starting with a trigger character, whatever the input', () => {
    const samples = ['=1', '"=1"', '@a,b', 'x\n-y', '\t=1', '"a""b",=c', ''];
    for (const s of samples) {
      const out = neutraliseCsv(s);
      for (const cell of out.split(/[,;\t\n]/)) expect(cell.replace(/^"/, ''), s).not.toMatch(/^[=+\-@\t]/);
    }
  });
});

describe('csvCell', () => {
  it('writes cells for an export: formulas neutralised and quoted, numbers as they are', () => {
    expect(csvCell('=1+1')).toBe('"\'=1+1"');
    expect(csvCell(-3.5)).toBe('-3.5');
    expect(csvCell('a,b')).toBe('"a,b"');
    expect(csvCell(null)).toBe('');
    expect(neutraliseCell('-')).toBe("'-");
  });
});
