import { describe, expect, it } from 'vitest';
import { assess } from '@/simulation';
import { exampleDesign } from '../examples/exampleDesign';
import {
  findingNumberLines,
  formatFindingNumber,
  humanKey,
  localiseFindingText,
  unmetText,
} from './findingFormat';

const metric = { length: 'cm' as const, temp: 'C' as const };
const imperial = { length: 'in' as const, temp: 'F' as const };

describe('finding numbers', () => {
  it('humanises keys', () => {
    expect(humanKey('baskingMeanUvi')).toBe('Basking mean UVI');
    expect(humanKey('shadeFraction')).toBe('Shade fraction');
    expect(humanKey('zoneMaxLo')).toBe('Zone max, lower bound');
  });

  it('converts temperatures and lengths by key', () => {
    // °F = °C × 9/5 + 32 (definition of the Fahrenheit scale); 1 in = 2.54 cm exactly.
    expect(formatFindingNumber('hotSpotC', 35, { length: 'cm', temp: 'F' })).toEqual({
      label: 'Hot spot',
      value: '95 °F',
    });
    expect(formatFindingNumber('lampDistanceCm', 25.4, { length: 'in', temp: 'C' })).toEqual({
      label: 'Lamp distance',
      value: '10 in',
    });
    expect(formatFindingNumber('closestCm', 15, imperial).value).toBe('5.91 in');
    expect(formatFindingNumber('maxUvi', 3.456, metric)).toEqual({
      label: 'Highest UVI reached',
      value: '3.46',
    });
    expect(formatFindingNumber('peakUvi', 3.456, metric)).toEqual({ label: 'Peak UVI', value: '3.46' });
    expect(formatFindingNumber('baskingUw', 80.2, metric).value).toBe('80 µW/cm²');
    expect(formatFindingNumber('maxUvb', 80.2, imperial).value).toBe('80 µW/cm²');
  });

  it('reads the sheet targets by the finding they belong to', () => {
    expect(formatFindingNumber('targetLo', 40, imperial, 'hot-spot')).toEqual({
      label: 'Target on the species sheet, from',
      value: '104 °F',
    });
    expect(formatFindingNumber('targetHi', 28, metric, 'cool-end').value).toBe('28 °C');
    expect(formatFindingNumber('targetHi', 120, imperial, 'basking-uvb').value).toBe('120 µW/cm²');
  });

  it('joins lower and upper bounds into one range line', () => {
    expect(findingNumberLines('hot-spot', { hotC: 43.8, targetLo: 40, targetHi: 45 }, imperial)).toEqual([
      { label: 'Hottest reachable surface', value: '110.8 °F' },
      { label: 'Target on the species sheet', value: '104–113 °F' },
    ]);
    expect(
      findingNumberLines('basking-uvi', { maxUvi: 1.45, zone: 4, zoneMaxLo: 4.5, zoneMaxHi: 9.5 }, metric),
    ).toEqual([
      { label: 'Highest UVI reached', value: '1.45' },
      { label: 'UV zone of the species', value: '4' },
      { label: 'Zone range of the basking UVI', value: '4.5–9.5' },
    ]);
  });

  it('states when the need stops being met', () => {
    expect(unmetText(7, 24)).toMatch(/month 7/);
    expect(unmetText(null, 24)).toMatch(/after 24 months/);
    expect(unmetText(0, 24)).toMatch(/even with new lamps/);
  });
});

describe('finding messages in the user’s units', () => {
  it('converts temperatures, ranges and lengths, and leaves µW/cm² alone', () => {
    const text =
      'The hottest surface is about 43.8 °C; the sheet needs 40.0–45.0 °C (room 24.0 °C). ' +
      'uv1 is within 15 cm (closest about 12 cm). The spot gets about 80 µW/cm² of UVB.';
    expect(localiseFindingText(text, imperial)).toBe(
      'The hottest surface is about 110.8 °F; the sheet needs 104–113 °F (room 75.2 °F). ' +
        'uv1 is within 5.9 in (closest about 4.7 in). The spot gets about 80 µW/cm² of UVB.',
    );
    expect(localiseFindingText(text, metric)).toBe(text);
    expect(localiseFindingText('below 0 °C, at -10 °C', { length: 'cm', temp: 'F' })).toBe(
      'below 32 °F, at 14 °F',
    );
  });

  it('leaves no °C or cm in any engine finding when °F and inches are chosen', () => {
    const a = assess(exampleDesign(), {
      name: 'Test skink',
      uvZone: 3,
      baskingSurfaceC: [35, 40],
      coolEndC: [22, 28],
      nightMinC: 18,
      uvbTargetUw: [50, 150],
    });
    expect(a.findings.length).toBeGreaterThan(5);
    const hot = a.findings.find((f) => f.id === 'hot-spot')!;
    const shown = localiseFindingText(hot.message, imperial);
    // The message carries °C to one decimal; its °F is converted from that figure.
    const shownC = Math.round(hot.numbers.hotC! * 10) / 10;
    expect(shown).toContain(`${Math.round(((shownC * 9) / 5 + 32) * 10) / 10} °F`);
    expect(shown).toContain('95–104 °F');
    for (const f of a.findings) {
      const m = localiseFindingText(f.message, imperial);
      expect(m).not.toMatch(/°C/);
      expect(m.replace(/µW\/cm²/g, '')).not.toMatch(/\d\s*cm\b/);
    }
  });
});
