import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../examples/exampleDesign';
import { FIT_PADDING_PX, fitPadding, fitView, stillFitted, zoomBy } from './actions';
import { StudioStore } from './store';

describe('fitting the design to the canvas', () => {
  it('keeps the full margin from tablet width up and gives a phone’s few pixels to the design', () => {
    expect(fitPadding(1280)).toBe(FIT_PADDING_PX);
    expect(fitPadding(820)).toBe(FIT_PADDING_PX);
    expect(fitPadding(390)).toBe(35);
    expect(fitPadding(200)).toBe(28);
  });

  it('on a 390 px wide canvas the 120 cm enclosure spans over four fifths of the width', () => {
    const store = new StudioStore(exampleDesign(), { viewport: { width: 390, height: 600 } });
    fitView(store);
    expect(store.session.camera.zoom * 120).toBeGreaterThan(390 * 0.8);
  });

  it('knows whether the camera is still as Fit left it, so a banner arriving refits the design', () => {
    const store = new StudioStore(exampleDesign(), { viewport: { width: 390, height: 600 } });
    fitView(store);
    expect(stillFitted(store, { width: 390, height: 600 })).toBe(true);
    // The canvas got shorter (a banner above it): that camera no longer fits the new viewport.
    expect(stillFitted(store, { width: 390, height: 450 })).toBe(false);
    zoomBy(store, 1.25);
    expect(stillFitted(store, { width: 390, height: 600 })).toBe(false);
  });
});
