import { describe, expect, it } from 'vitest';
import { canonicalShortcut, displayShortcut, isTypingTarget, normaliseKey } from './shortcuts';

describe('normaliseKey', () => {
  it('treats Ctrl and ⌘ alike as Mod and upper-cases letters', () => {
    expect(normaliseKey({ key: 'z', ctrlKey: true })).toBe('Mod+Z');
    expect(normaliseKey({ key: 'z', metaKey: true })).toBe('Mod+Z');
    expect(normaliseKey({ key: 'Z', metaKey: true, shiftKey: true })).toBe('Mod+Shift+Z');
    expect(normaliseKey({ key: 'v' })).toBe('V');
  });

  it('drops Shift on printable symbols that already carry it', () => {
    expect(normaliseKey({ key: '?', shiftKey: true })).toBe('?');
    expect(normaliseKey({ key: '}', shiftKey: true })).toBe('}');
  });

  it('keeps Shift on named keys and ignores bare modifiers', () => {
    expect(normaliseKey({ key: 'ArrowLeft', shiftKey: true })).toBe('Shift+ArrowLeft');
    expect(normaliseKey({ key: 'Shift', shiftKey: true })).toBeNull();
    expect(normaliseKey({ key: ' ' })).toBe('Space');
  });
});

describe('canonicalShortcut', () => {
  it('matches what normaliseKey produces for the same keys', () => {
    expect(canonicalShortcut('shift+mod+z')).toBe('Mod+Shift+Z');
    expect(canonicalShortcut('Delete')).toBe('Delete');
    expect(canonicalShortcut('Shift+ArrowUp')).toBe('Shift+ArrowUp');
    expect(canonicalShortcut('+')).toBe('+');
    expect(canonicalShortcut('Mod++')).toBe('Mod++');
  });

  it('rejects unknown modifiers', () => {
    expect(() => canonicalShortcut('Hyper+Z')).toThrow(/Unknown modifier/);
  });
});

describe('displayShortcut', () => {
  it('writes platform forms', () => {
    expect(displayShortcut('Mod+Shift+Z', false)).toBe('Ctrl+Shift+Z');
    expect(displayShortcut('Mod+Shift+Z', true)).toBe('⌘⇧Z');
    expect(displayShortcut('Shift+ArrowLeft', false)).toBe('Shift+←');
    expect(displayShortcut('Mod++', false)).toBe('Ctrl++');
  });
});

describe('isTypingTarget', () => {
  it('recognises text inputs but not buttons', () => {
    expect(isTypingTarget({ tagName: 'INPUT', type: 'number' } as unknown as EventTarget)).toBe(true);
    expect(isTypingTarget({ tagName: 'INPUT', type: 'range' } as unknown as EventTarget)).toBe(false);
    expect(isTypingTarget({ tagName: 'BUTTON' } as unknown as EventTarget)).toBe(false);
    expect(isTypingTarget(null)).toBe(false);
  });
});
