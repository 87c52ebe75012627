// Every studio command in one place: the toolbar, the palette, the menus, the help panel and the
// keyboard all read this list, so a command has exactly one label, one shortcut set and one action.
import * as A from '../state/actions';
import * as B from '../state/backdropActions';
import * as Z from '../state/depthActions';
import { isPlaceTool, type FieldView, type Tool } from '../state/session';
import { OBJECT_KINDS, OBJECT_TYPES } from '@/shared/object-kinds';
import type { StudioStore } from '../state/store';
import { canonicalShortcut, normaliseKey, type KeyLike } from './shortcuts';

export interface CommandContext {
  store: StudioStore;
  /** Saves at once instead of waiting for autosave. */
  saveNow?: () => void;
}

export type CommandGroup =
  'Tools' | 'Edit' | 'Arrange' | 'Depth' | 'View' | 'Fields' | 'Photo' | 'Units' | 'Help';

export interface Command {
  id: string;
  label: string;
  group: CommandGroup;
  /** Canonical shortcuts (see shortcuts.ts); the first is the one shown. */
  shortcuts: string[];
  run(ctx: CommandContext): void;
  enabled?(ctx: CommandContext): boolean;
  /** For tools and toggles: whether it is currently on. */
  checked?(ctx: CommandContext): boolean;
  /** Let the key through while typing in a field (only for Mod shortcuts that make sense there). */
  allowInInputs?: boolean;
  /** Whether the command exists in this studio at all (help lists only these); default: always. */
  available?(ctx: CommandContext): boolean;
}

const editable = ({ store }: CommandContext) => !store.readOnly;
const photoStudio = ({ store }: CommandContext) => B.hasEnclosurePhotos(store);
const hasBackdrop = (ctx: CommandContext) => editable(ctx) && ctx.store.design.backdrop !== undefined;
const hasSelection = (ctx: CommandContext) => editable(ctx) && ctx.store.session.selection.length > 0;
const hasSelectedLamp = (ctx: CommandContext) => editable(ctx) && Z.selectedLamps(ctx.store).length > 0;

function tool(id: Tool, label: string, key: string): Command {
  return {
    id: `tool.${id}`,
    label,
    group: 'Tools',
    shortcuts: [key],
    run: ({ store }) => A.setTool(store, id),
    checked: ({ store }) => store.session.tool === id,
    // Tools that add objects are not offered in a view-only studio.
    enabled: isPlaceTool(id) ? editable : undefined,
  };
}

function nudge(dir: 'Left' | 'Right' | 'Up' | 'Down', big: boolean): Command {
  const dx = dir === 'Left' ? -1 : dir === 'Right' ? 1 : 0;
  const dy = dir === 'Down' ? -1 : dir === 'Up' ? 1 : 0;
  const k = big ? 10 : 1;
  return {
    id: `edit.nudge${dir}${big ? '10' : ''}`,
    label: `Nudge ${dir.toLowerCase()}${big ? ' ×10' : ''}`,
    group: 'Arrange',
    shortcuts: [`${big ? 'Shift+' : ''}Arrow${dir}`],
    run: ({ store }) => A.nudgeSelection(store, dx * k, dy * k),
    enabled: hasSelection,
  };
}

/** A view setting turned on or off by its command (checked while on). */
function sessionSwitch(
  key: 'snapGrid' | 'snapSurfaces' | 'fieldsVisible',
  id: string,
  group: CommandGroup,
  label: string,
  shortcut: string,
): Command {
  return {
    id,
    label,
    group,
    shortcuts: [shortcut],
    run: ({ store }) => store.setSession((s) => ({ [key]: !s[key] })),
    checked: ({ store }) => store.session[key],
  };
}

/** Shows one field (and the fields, if they were hidden). */
function showField(field: FieldView, id: string, label: string, shortcut: string): Command {
  return {
    id,
    label,
    group: 'Fields',
    shortcuts: [shortcut],
    run: ({ store }) => store.setSession({ field, fieldsVisible: true }),
    checked: ({ store }) => store.session.field === field,
  };
}

export const COMMANDS: readonly Command[] = [
  tool('select', 'Select', 'V'),
  tool('pan', 'Pan', 'H'),
  ...OBJECT_TYPES.map((t) => tool(t, OBJECT_KINDS[t].tool.label, OBJECT_KINDS[t].tool.key)),
  tool('probe', 'Probe', 'I'),
  tool('ruler', 'Ruler', 'R'),
  {
    id: 'edit.undo',
    label: 'Undo',
    group: 'Edit',
    shortcuts: ['Mod+Z'],
    run: ({ store }) => store.undo(),
    enabled: ({ store }) => store.canUndo(),
  },
  {
    id: 'edit.redo',
    label: 'Redo',
    group: 'Edit',
    shortcuts: ['Mod+Shift+Z', 'Mod+Y'],
    run: ({ store }) => store.redo(),
    enabled: ({ store }) => store.canRedo(),
  },
  {
    id: 'edit.duplicate',
    label: 'Duplicate',
    group: 'Edit',
    shortcuts: ['Mod+D'],
    run: ({ store }) => A.duplicateSelection(store),
    enabled: ({ store }) => !store.readOnly && A.selectedObjects(store).length > 0,
  },
  {
    id: 'edit.delete',
    label: 'Delete',
    group: 'Edit',
    shortcuts: ['Delete', 'Backspace'],
    run: ({ store }) => A.deleteSelection(store),
    enabled: hasSelection,
  },
  {
    id: 'edit.selectAll',
    label: 'Select all',
    group: 'Edit',
    shortcuts: ['Mod+A'],
    run: ({ store }) => A.selectAll(store),
    enabled: ({ store }) => store.design.objects.length > 0,
  },
  {
    id: 'edit.selectNext',
    label: 'Select next object',
    group: 'Edit',
    shortcuts: ['N'],
    run: ({ store }) => A.selectStep(store, 1),
    enabled: ({ store }) => store.design.objects.length > 0,
  },
  {
    id: 'edit.selectPrevious',
    label: 'Select previous object',
    group: 'Edit',
    shortcuts: ['Shift+N'],
    run: ({ store }) => A.selectStep(store, -1),
    enabled: ({ store }) => store.design.objects.length > 0,
  },
  {
    id: 'edit.deselect',
    label: 'Deselect / cancel',
    group: 'Edit',
    shortcuts: ['Escape'],
    run: ({ store }) => {
      if (store.inGesture) store.cancelGesture();
      store.setSession({
        selection: [],
        ruler: null,
        marquee: null,
        highlight: null,
        helpOpen: false,
        backdropAdjust: false,
      });
      if (store.session.tool !== 'select') A.setTool(store, 'select');
    },
  },
  {
    id: 'edit.placeHere',
    label: 'Place with the current tool in the middle',
    group: 'Edit',
    shortcuts: ['Enter'],
    run: ({ store }) => {
      const t = store.session.tool;
      if (isPlaceTool(t)) A.placeAtCentre(store, t);
    },
    enabled: ({ store }) => !store.readOnly && isPlaceTool(store.session.tool),
  },
  {
    id: 'file.save',
    label: 'Save now',
    group: 'Edit',
    shortcuts: ['Mod+S'],
    run: ({ saveNow }) => saveNow?.(),
    allowInInputs: true,
  },
  { ...nudge('Left', false) },
  { ...nudge('Right', false) },
  { ...nudge('Up', false) },
  { ...nudge('Down', false) },
  { ...nudge('Left', true) },
  { ...nudge('Right', true) },
  { ...nudge('Up', true) },
  { ...nudge('Down', true) },
  {
    id: 'arrange.forward',
    label: 'Bring forward',
    group: 'Arrange',
    shortcuts: [']'],
    run: ({ store }) => A.arrangeSelection(store, 'forward'),
    enabled: hasSelection,
  },
  {
    id: 'arrange.backward',
    label: 'Send backward',
    group: 'Arrange',
    shortcuts: ['['],
    run: ({ store }) => A.arrangeSelection(store, 'backward'),
    enabled: hasSelection,
  },
  {
    id: 'arrange.front',
    label: 'Bring to front',
    group: 'Arrange',
    shortcuts: ['}'],
    run: ({ store }) => A.arrangeSelection(store, 'front'),
    enabled: hasSelection,
  },
  {
    id: 'arrange.back',
    label: 'Send to back',
    group: 'Arrange',
    shortcuts: ['{'],
    run: ({ store }) => A.arrangeSelection(store, 'back'),
    enabled: hasSelection,
  },
  {
    id: 'depth.sectionBack',
    label: 'Move the side view towards the back',
    group: 'Depth',
    shortcuts: ['Alt+ArrowUp'],
    run: ({ store }) => Z.moveSection(store, 1),
    enabled: editable,
  },
  {
    id: 'depth.sectionFront',
    label: 'Move the side view towards the front',
    group: 'Depth',
    shortcuts: ['Alt+ArrowDown'],
    run: ({ store }) => Z.moveSection(store, -1),
    enabled: editable,
  },
  {
    id: 'depth.lampBack',
    label: 'Move the selected lamp towards the back',
    group: 'Depth',
    shortcuts: ['PageUp'],
    run: ({ store }) => Z.moveSelectedLampsDepth(store, 1),
    enabled: hasSelectedLamp,
  },
  {
    id: 'depth.lampFront',
    label: 'Move the selected lamp towards the front',
    group: 'Depth',
    shortcuts: ['PageDown'],
    run: ({ store }) => Z.moveSelectedLampsDepth(store, -1),
    enabled: hasSelectedLamp,
  },
  {
    id: 'depth.sectionToLamp',
    label: 'Show the side view through the selected lamp',
    group: 'Depth',
    shortcuts: ['Shift+L'],
    run: ({ store }) => {
      const lamp = Z.selectedLamps(store)[0];
      if (lamp) Z.sectionThroughLamp(store, lamp.id);
    },
    enabled: hasSelectedLamp,
  },
  {
    id: 'view.zoomIn',
    label: 'Zoom in',
    group: 'View',
    shortcuts: ['=', '+'],
    run: ({ store }) => A.zoomBy(store, 1.25),
  },
  {
    id: 'view.zoomOut',
    label: 'Zoom out',
    group: 'View',
    shortcuts: ['-'],
    run: ({ store }) => A.zoomBy(store, 0.8),
  },
  {
    id: 'view.fit',
    label: 'Fit to screen',
    group: 'View',
    shortcuts: ['0'],
    run: ({ store }) => A.fitView(store),
  },
  sessionSwitch('snapGrid', 'view.snapGrid', 'View', 'Snap to grid', 'Shift+G'),
  sessionSwitch('snapSurfaces', 'view.snapSurfaces', 'View', 'Snap to surfaces', 'Shift+S'),
  sessionSwitch('fieldsVisible', 'fields.toggle', 'Fields', 'Show fields', 'Shift+F'),
  showField('uvb', 'fields.uvb', 'UVB field (µW/cm²)', '1'),
  showField('uvi', 'fields.uvi', 'UV Index field', '2'),
  showField('tempC', 'fields.temp', 'Surface temperature field', '3'),
  {
    id: 'backdrop.toggle',
    label: 'Show the photo backdrop',
    group: 'Photo',
    shortcuts: ['B'],
    run: ({ store }) => B.toggleBackdrop(store),
    enabled: hasBackdrop,
    checked: ({ store }) => store.design.backdrop?.visible === true,
    available: photoStudio,
  },
  {
    id: 'backdrop.adjust',
    label: 'Adjust the photo (drag it, or its corners)',
    group: 'Photo',
    shortcuts: ['Shift+B'],
    run: ({ store }) => B.toggleBackdropAdjust(store),
    enabled: (ctx) => hasBackdrop(ctx) && (ctx.store.session.backdropAdjust || B.backdropShown(ctx.store)),
    checked: ({ store }) => store.session.backdropAdjust,
    available: photoStudio,
  },
  {
    id: 'backdrop.fit',
    label: 'Fit the photo to the enclosure',
    group: 'Photo',
    shortcuts: [],
    run: ({ store }) => B.fitBackdrop(store),
    enabled: hasBackdrop,
    available: photoStudio,
  },
  {
    id: 'units.length',
    label: 'Switch cm / in',
    group: 'Units',
    shortcuts: ['U'],
    run: ({ store }) => store.setSession((s) => ({ lengthUnit: s.lengthUnit === 'cm' ? 'in' : 'cm' })),
  },
  {
    id: 'units.temp',
    label: 'Switch °C / °F',
    group: 'Units',
    shortcuts: ['Shift+U'],
    run: ({ store }) => store.setSession((s) => ({ tempUnit: s.tempUnit === 'C' ? 'F' : 'C' })),
  },
  {
    id: 'help.shortcuts',
    label: 'Keyboard shortcuts',
    group: 'Help',
    shortcuts: ['?'],
    run: ({ store }) => store.setSession((s) => ({ helpOpen: !s.helpOpen })),
  },
];

const BY_ID = new Map(COMMANDS.map((c) => [c.id, c]));

export function command(id: string): Command {
  const c = BY_ID.get(id);
  if (!c) throw new Error(`Unknown command "${id}"`);
  return c;
}

/** Canonical shortcut → command. Built once; duplicates are a programming error caught by tests. */
export function buildShortcutMap(commands: readonly Command[]): Map<string, Command> {
  const map = new Map<string, Command>();
  for (const c of commands) {
    for (const s of c.shortcuts) {
      const key = canonicalShortcut(s);
      const other = map.get(key);
      if (other) throw new Error(`Shortcut ${key} is used by both "${other.id}" and "${c.id}"`);
      map.set(key, c);
    }
  }
  return map;
}

const SHORTCUTS = buildShortcutMap(COMMANDS);

export function commandForKey(e: KeyLike): Command | undefined {
  const key = normaliseKey(e);
  return key ? SHORTCUTS.get(key) : undefined;
}

export function isAvailable(c: Command, ctx: CommandContext): boolean {
  return c.available ? c.available(ctx) : true;
}

export function isEnabled(c: Command, ctx: CommandContext): boolean {
  return isAvailable(c, ctx) && (c.enabled ? c.enabled(ctx) : true);
}

/** Runs a command if it is enabled; returns whether it ran. */
export function runCommand(c: Command, ctx: CommandContext): boolean {
  if (!isEnabled(c, ctx)) return false;
  c.run(ctx);
  return true;
}
