import { describe, expect, it } from 'vitest';
import { designSchema } from '@/simulation';
import { command, commandForKey, runCommand } from '../commands/registry';
import { exampleDesign } from '../examples/exampleDesign';
import { depthRelation, keepWithinDepth, moveLampsZ, setLampsZ, setSectionZ } from './depth';
import { setEnclosure } from './document';
import { StudioStore } from './store';

const lamp = (d: ReturnType<typeof exampleDesign>, id: string) => d.objects.find((o) => o.id === id);

describe('depth edits', () => {
  it('set the side view and a lamp’s depth, clamped to the enclosure; no change keeps the reference', () => {
    const d = exampleDesign(); // 60 cm deep
    const s = setSectionZ(d, 12.5);
    expect(s.enclosure.sectionZ).toBe(12.5);
    expect(setSectionZ(s, 12.5)).toBe(s);
    expect(setSectionZ(d, 80).enclosure.sectionZ).toBe(60);
    expect(setSectionZ(d, -3).enclosure.sectionZ).toBe(0);
    const l = setLampsZ(d, ['uv1', 'b1'], 45);
    expect(lamp(l, 'uv1')).toMatchObject({ z: 45 });
    expect(lamp(l, 'b1')).not.toHaveProperty('z'); // a perch spans the depth
    expect(setLampsZ(l, ['uv1'], 45)).toBe(l);
    // Moving from the default (half the depth) by 2.54 cm.
    expect(lamp(moveLampsZ(d, ['heat1'], 2.54), 'heat1')).toMatchObject({ z: 32.54 });
    expect(designSchema.safeParse(moveLampsZ(d, ['uv1'], 500)).success).toBe(true);
  });

  it('a shallower enclosure brings the plane and lamps beyond its back to the back, in one step', () => {
    let d = setSectionZ(setLampsZ(exampleDesign(), ['uv1'], 55), 50);
    d = setLampsZ(d, ['heat1'], 10);
    const shallow = setEnclosure(d, { depth: 45 });
    expect(shallow.enclosure).toMatchObject({ depth: 45, sectionZ: 45 });
    expect(lamp(shallow, 'uv1')).toMatchObject({ z: 45 });
    expect(lamp(shallow, 'heat1')).toMatchObject({ z: 10 });
    expect(designSchema.safeParse(shallow).success).toBe(true);
    expect(keepWithinDepth(shallow)).toBe(shallow);
  });
});

describe('depth commands', () => {
  const ctx = () => ({ store: new StudioStore(exampleDesign()) });

  it('move the side view a grid step per key, one undo step each', () => {
    const c = ctx();
    expect(commandForKey({ key: 'ArrowUp', altKey: true })?.id).toBe('depth.sectionBack');
    runCommand(commandForKey({ key: 'ArrowUp', altKey: true })!, c);
    runCommand(commandForKey({ key: 'ArrowUp', altKey: true })!, c);
    expect(c.store.design.enclosure.sectionZ).toBe(32);
    runCommand(command('depth.sectionFront'), c);
    expect(c.store.design.enclosure.sectionZ).toBe(31);
    c.store.undo();
    expect(c.store.design.enclosure.sectionZ).toBe(32);
    c.store.undo();
    c.store.undo();
    expect(c.store.design.enclosure).not.toHaveProperty('sectionZ');
  });

  it('move only the selected lamps in depth, in half inches when working in inches', () => {
    const c = ctx();
    expect(command('depth.lampBack').enabled?.(c)).toBe(false);
    c.store.setSession({ selection: ['b1'] });
    expect(command('depth.lampBack').enabled?.(c)).toBe(false);
    c.store.setSession({ selection: ['uv1', 'b1'], lengthUnit: 'in' });
    runCommand(commandForKey({ key: 'PageUp' })!, c);
    expect(lamp(c.store.design, 'uv1')).toMatchObject({ z: 31.27 });
    expect(lamp(c.store.design, 'heat1')).not.toHaveProperty('z');
    runCommand(commandForKey({ key: 'PageDown' })!, c);
    runCommand(commandForKey({ key: 'PageDown' })!, c);
    expect(lamp(c.store.design, 'uv1')).toMatchObject({ z: 28.73 });
    c.store.undo();
    expect(lamp(c.store.design, 'uv1')).toMatchObject({ z: 30 });
  });

  it('put the side view through the selected lamp', () => {
    const c = ctx();
    c.store.edit((d) => setLampsZ(d, ['heat1'], 8));
    c.store.setSession({ selection: ['heat1'] });
    runCommand(commandForKey({ key: 'L', shiftKey: true })!, c);
    expect(c.store.design.enclosure.sectionZ).toBe(8);
  });

  it('do nothing in a view-only studio', () => {
    const store = new StudioStore(exampleDesign(), { selection: ['uv1'] }, { readOnly: true });
    expect(runCommand(command('depth.sectionBack'), { store })).toBe(false);
    expect(runCommand(command('depth.lampBack'), { store })).toBe(false);
    expect(store.design).toEqual(exampleDesign());
  });
});

describe('depth in words', () => {
  it('says where a lamp hangs relative to the side view, in the user’s unit', () => {
    const d = setSectionZ(exampleDesign(), 10);
    expect(depthRelation(d, { z: 10 }, 'cm')).toBe('on the side view');
    expect(depthRelation(d, { z: 30 }, 'cm')).toBe('20 cm behind the side view');
    expect(depthRelation(d, {}, 'in')).toBe('7.9 in behind the side view');
    expect(depthRelation(d, { z: 4.92 }, 'cm')).toBe('5.1 cm in front of the side view');
  });
});
