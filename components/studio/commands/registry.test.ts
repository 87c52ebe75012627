import { describe, expect, it } from 'vitest';
import { designSchema } from '@/simulation';
import { buildShortcutMap, command, commandForKey, COMMANDS, runCommand, type Command } from './registry';
import { canonicalShortcut } from './shortcuts';
import { StudioStore } from '../state/store';
import { exampleDesign } from '../examples/exampleDesign';
import { PLACE_TOOLS } from '../state/session';

function ctx() {
  return { store: new StudioStore(exampleDesign(), { viewport: { width: 1000, height: 600 } }) };
}

describe('command registry', () => {
  it('has unique ids, labels and shortcuts', () => {
    expect(new Set(COMMANDS.map((c) => c.id)).size).toBe(COMMANDS.length);
    expect(new Set(COMMANDS.map((c) => c.label)).size).toBe(COMMANDS.length);
    const all = COMMANDS.flatMap((c) => c.shortcuts.map(canonicalShortcut));
    expect(new Set(all).size).toBe(all.length);
  });

  it('refuses a duplicate shortcut', () => {
    const a: Command = { id: 'a', label: 'A', group: 'Edit', shortcuts: ['Mod+Z'], run: () => {} };
    const b: Command = { id: 'b', label: 'B', group: 'Edit', shortcuts: ['mod+z'], run: () => {} };
    expect(() => buildShortcutMap([a, b])).toThrow(/used by both/);
  });

  it('gives every tool a command with a shortcut', () => {
    for (const t of ['select', 'pan', ...PLACE_TOOLS, 'probe', 'ruler']) {
      expect(command(`tool.${t}`).shortcuts.length).toBeGreaterThan(0);
    }
  });

  it('maps key events to commands', () => {
    expect(commandForKey({ key: 'z', ctrlKey: true })?.id).toBe('edit.undo');
    expect(commandForKey({ key: 'Z', metaKey: true, shiftKey: true })?.id).toBe('edit.redo');
    expect(commandForKey({ key: '?', shiftKey: true })?.id).toBe('help.shortcuts');
    expect(commandForKey({ key: 'ArrowLeft', shiftKey: true })?.id).toBe('edit.nudgeLeft10');
    expect(commandForKey({ key: 'q' })).toBeUndefined();
  });
});

describe('commands on a store', () => {
  it('switches tools', () => {
    const c = ctx();
    runCommand(commandForKey({ key: 'p' })!, c);
    expect(c.store.session.tool).toBe('perch');
    expect(command('tool.perch').checked?.(c)).toBe(true);
  });

  it('nudges the selection by a grid step, ten with Shift, one undo step each', () => {
    const c = ctx();
    c.store.setSession({ selection: ['h1'] });
    runCommand(command('edit.nudgeRight'), c);
    runCommand(command('edit.nudgeUp10'), c);
    expect(c.store.design.objects.find((o) => o.id === 'h1')).toMatchObject({ x: 6, y: 10 });
    runCommand(command('edit.undo'), c);
    expect(c.store.design.objects.find((o) => o.id === 'h1')).toMatchObject({ x: 6, y: 0 });
    // In inches a step is half an inch.
    c.store.setSession({ lengthUnit: 'in' });
    runCommand(command('edit.nudgeLeft'), c);
    expect((c.store.design.objects.find((o) => o.id === 'h1') as { x: number }).x).toBeCloseTo(6 - 1.27, 10);
  });

  it('selects objects from the keyboard in drawing order, wrapping', () => {
    const c = ctx();
    runCommand(command('edit.selectNext'), c);
    expect(c.store.session.selection).toEqual(['uv1']);
    runCommand(command('edit.selectPrevious'), c);
    expect(c.store.session.selection).toEqual(['side']);
    runCommand(command('edit.selectNext'), c);
    expect(c.store.session.selection).toEqual(['uv1']);
  });

  it('is disabled when it would do nothing', () => {
    const c = ctx();
    expect(runCommand(command('edit.undo'), c)).toBe(false);
    expect(runCommand(command('edit.delete'), c)).toBe(false);
    expect(runCommand(command('edit.duplicate'), c)).toBe(false);
  });

  it('deletes, duplicates and arranges the selection, keeping the design valid', () => {
    const c = ctx();
    c.store.setSession({ selection: ['b1'] });
    runCommand(command('edit.duplicate'), c);
    expect(c.store.session.selection).toEqual(['perch-1']);
    runCommand(command('arrange.back'), c);
    expect(c.store.design.objects[0]?.id).toBe('perch-1');
    runCommand(command('edit.delete'), c);
    expect(c.store.design.objects.some((o) => o.id === 'perch-1')).toBe(false);
    expect(c.store.session.selection).toEqual([]);
    expect(designSchema.safeParse(c.store.design).success).toBe(true);
    runCommand(command('edit.undo'), c);
    expect(c.store.design.objects[0]?.id).toBe('perch-1');
  });

  it('places objects from the keyboard with valid defaults', () => {
    const c = ctx();
    for (const t of PLACE_TOOLS) {
      runCommand(command(`tool.${t}`), c);
      expect(runCommand(command('edit.placeHere'), c)).toBe(true);
      expect(c.store.session.tool).toBe('select');
    }
    expect(c.store.design.objects.length).toBe(8 + PLACE_TOOLS.length);
    const parsed = designSchema.safeParse(c.store.design);
    expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
    const lamp = c.store.design.objects.find((o) => o.id === 'lamp-1');
    expect(lamp).toMatchObject({ y: 62, form: 'tube', length: 55 }); // on the lid
  });

  it('fits a new tube to a narrow enclosure', () => {
    const c = ctx();
    c.store.load({ ...c.store.design, enclosure: { width: 45, height: 60, depth: 45 } });
    runCommand(command('tool.lamp'), c);
    runCommand(command('edit.placeHere'), c);
    expect(c.store.design.objects.find((o) => o.id === 'lamp-1')).toMatchObject({ length: 34, x: 23 }); // centre snapped to the 1 cm grid;
  });

  it('toggles units and fields and zooms about the centre', () => {
    const c = ctx();
    runCommand(command('units.length'), c);
    runCommand(command('units.temp'), c);
    expect(c.store.session).toMatchObject({ lengthUnit: 'in', tempUnit: 'F' });
    runCommand(command('fields.temp'), c);
    expect(c.store.session.field).toBe('tempC');
    runCommand(command('view.fit'), c);
    const z = c.store.session.camera.zoom;
    runCommand(command('view.zoomIn'), c);
    expect(c.store.session.camera.zoom).toBeCloseTo(z * 1.25, 10);
  });

  it('cancels a running gesture on Escape', () => {
    const c = ctx();
    c.store.beginGesture();
    c.store.edit((d) => ({ ...d, objects: [] }));
    runCommand(command('edit.deselect'), c);
    expect(c.store.design.objects.length).toBe(8);
    expect(c.store.canUndo()).toBe(false);
  });
});
