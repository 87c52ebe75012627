import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { bandsFor, scaleFor, simulate } from '@/shared/designs/simulate';
import { hotSpotMarker } from '@/shared/designs/figures';
import { benchDesign } from '@/simulation/testing/fixtures';
import type { Design } from '@/simulation';
import { FieldSvg } from './FieldSvg';
import { DesignShapes, SKETCH_LOOK } from './DesignShapes';
import { CautionList } from '@/components/cautions/CautionList';
import { FindingList } from '@/components/cautions/FindingList';
import { assessFor } from '@/shared/designs/assessment';
import { NO_SPECIES_SAFETY_LEAD } from '@/shared/cautions';
import { staticHtml, staticSvg } from './static-svg';

describe('staticSvg', () => {
  it('writes the share pictures exactly as React renders them inline', () => {
    const design: Design = {
      ...benchDesign(2, 2),
      objects: [
        ...benchDesign(2, 2).objects,
        { type: 'foliage', id: 'f1', x: 10, y: 0, width: 20, height: 30 },
        { type: 'glass', id: 'g1', x1: 0, y1: 0, x2: 0, y2: 40 },
      ],
    };
    const sim = simulate(design);
    for (const field of ['uvi', 'uvb', 'tempC'] as const) {
      const scale = scaleFor(field, [sim]);
      const element = createElement(FieldSvg, {
        design,
        bands: bandsFor(sim, scale),
        scale,
        title: `${scale.label} of "Tank <1>" & co's`,
        markers: hotSpotMarker(sim.figures),
      });
      const ours = staticSvg(element);
      expect(ours, field).toBe(renderToStaticMarkup(element));
      expect(ours).toContain('stroke-width=');
      expect(ours).toContain('&quot;Tank &lt;1&gt;&quot; &amp; co&#x27;s');
    }
  });

  it('writes fragments, styles and data attributes as React does', () => {
    const element = (
      <svg viewBox="0 0 10 10">
        <DesignShapes objects={benchDesign(1, 1).objects} look={SKETCH_LOOK} />
        <g style={{ fillOpacity: 0.5, strokeWidth: 2 }} aria-hidden="true">
          <text textAnchor="middle">
            {'a'}
            {2}
          </text>
          {null}
          {false}
        </g>
      </svg>
    );
    expect(staticSvg(element)).toBe(renderToStaticMarkup(element).replace('<!-- -->', ''));
  });

  it('refuses what a static picture cannot hold', () => {
    expect(() => staticSvg(<rect onClick={() => undefined} />)).toThrow(/event handler/);
  });
});

describe('staticHtml', () => {
  // A made-up sheet for the test (figures invented, not husbandry advice), and the bench design.
  const sheet = {
    name: 'Example <lizard> & "co"',
    uvZone: 3 as const,
    baskingSurfaceC: [35, 40] as [number, number],
    coolEndC: [22, 26] as [number, number],
    nightMinC: 16,
  };
  const design = benchDesign(1, 1);

  it('writes the share page’s species check and cautions exactly as React renders them', () => {
    for (const species of [sheet, null]) {
      const assessment = assessFor(design, species);
      expect(assessment.findings.length).toBeGreaterThan(2);
      for (const element of [
        species ? (
          <FindingList key="species" assessment={assessment} speciesName={species.name} />
        ) : (
          <FindingList
            key="general"
            assessment={assessment}
            title="Safety checks"
            lead={NO_SPECIES_SAFETY_LEAD}
          />
        ),
        <CautionList key="cautions" design={design} assessment={assessment} />,
      ]) {
        const ours = staticHtml(element);
        expect(ours).toBe(renderToStaticMarkup(element));
        expect(ours).toMatch(/^<section aria-label="[^"]+" class="space-y-\d"><.+<li class=/);
      }
    }
    expect(
      staticHtml(<FindingList assessment={assessFor(design, sheet)} speciesName={sheet.name} />),
    ).toContain('Example &lt;lizard&gt; &amp; &quot;co&quot;');
  });

  it('writes void elements, booleans and aria attributes as React does', () => {
    const element = (
      <p aria-hidden={false} data-open={false} hidden={false}>
        a<br />
        <details open>
          <summary>b</summary>
        </details>
      </p>
    );
    expect(staticHtml(element)).toBe(renderToStaticMarkup(element));
  });

  it('refuses what React would write differently', () => {
    expect(() => staticHtml(<td colSpan={2} />)).toThrow(/not written as React would/);
    expect(() => staticHtml(<p style={{ fontSize: 12 }} />)).toThrow(/not written as React would/);
    expect(() => staticHtml(<div dangerouslySetInnerHTML={{ __html: '<b>' }} />)).toThrow(/not written/);
    expect(() => staticHtml(<button onClick={() => undefined} />)).toThrow(/event handler/);
  });
});
