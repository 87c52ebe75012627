import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { LAMP_TECHS } from '@/simulation';
import { CautionList } from './CautionList';

// What a lamp type's page shows beside its defaults (app/(app)/lamp-catalogue/[id]/page.tsx passes the
// entry's technology and spectrum).
const lampPage = (uviPerUvb: number) =>
  renderToStaticMarkup(
    createElement(CautionList, {
      techs: ['mercury-vapour'],
      spectra: [{ name: 'Vapour lamp 160 W', uviPerUvb, uvbAt30: LAMP_TECHS['mercury-vapour'].uvbAt30 }],
      title: 'Safety with this lamp',
    }),
  );

describe('a lamp type’s cautions', () => {
  it('warn of short-wave UVB when the entry’s UV Index per µW/cm² is over twice sunlight’s', () => {
    // Sunlight about 0.04 UV Index per µW/cm², twice that the point to warn (from memory).
    const html = lampPage(0.1);
    expect(html).toContain('Short-wave UVB: judge this lamp by UV Index');
    expect(html).toContain('Vapour lamp 160 W gives about 0.1 UV Index per µW/cm²');
    expect(html.indexOf('UV can injure eyes and skin')).toBeLessThan(html.indexOf('Short-wave UVB'));
  });

  it('leave it out for the technology’s own, sunlight-like spectrum', () => {
    const html = lampPage(LAMP_TECHS['mercury-vapour'].uviPerUvb);
    expect(html).toContain('UV can injure eyes and skin');
    expect(html).not.toContain('Short-wave');
  });
});
