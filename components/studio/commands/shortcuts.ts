// Keyboard shortcuts as canonical strings ("Mod+Z", "Shift+ArrowLeft", "V", "?").
// "Mod" is Ctrl, or ⌘ on a Mac. For printable non-letter keys the browser already applies
// Shift to `key` ("?" rather than "Shift+/"), so Shift is not part of their canonical form.

export interface KeyLike {
  key: string;
  ctrlKey?: boolean;
  metaKey?: boolean;
  shiftKey?: boolean;
  altKey?: boolean;
}

const NAMED: Record<string, string> = {
  ' ': 'Space',
  Spacebar: 'Space',
  Esc: 'Escape',
  Del: 'Delete',
  Left: 'ArrowLeft',
  Right: 'ArrowRight',
  Up: 'ArrowUp',
  Down: 'ArrowDown',
};

function isLetter(k: string): boolean {
  return k.length === 1 && k.toLowerCase() !== k.toUpperCase();
}

export function normaliseKey(e: KeyLike): string | null {
  let key = NAMED[e.key] ?? e.key;
  if (key === 'Shift' || key === 'Control' || key === 'Meta' || key === 'Alt' || key === 'Dead') return null;
  const mod = Boolean(e.ctrlKey || e.metaKey);
  const printable = key.length === 1;
  let shift = Boolean(e.shiftKey);
  if (printable && !isLetter(key)) shift = false;
  if (isLetter(key)) key = key.toUpperCase();
  const parts: string[] = [];
  if (mod) parts.push('Mod');
  if (e.altKey) parts.push('Alt');
  if (shift) parts.push('Shift');
  parts.push(key);
  return parts.join('+');
}

/** Splits "Mod+Shift+Z" into its parts; the plus key itself is written "+" or "Mod++". */
function splitShortcut(written: string): string[] {
  if (written === '+') return ['+'];
  if (written.endsWith('++')) return [...written.slice(0, -2).split('+').filter(Boolean), '+'];
  return written.split('+');
}

/** Parses a written shortcut ("shift+mod+z") into canonical form, or throws on nonsense. */
export function canonicalShortcut(written: string): string {
  const raw = splitShortcut(written);
  const key = raw[raw.length - 1];
  if (!key) throw new Error(`Empty shortcut: "${written}"`);
  const mods = new Set(raw.slice(0, -1).map((m) => m.toLowerCase()));
  for (const m of mods) {
    if (!['mod', 'alt', 'shift'].includes(m)) throw new Error(`Unknown modifier "${m}" in "${written}"`);
  }
  const norm = normaliseKey({
    key: key.length === 1 ? key : (NAMED[key] ?? key),
    ctrlKey: mods.has('mod'),
    altKey: mods.has('alt'),
    shiftKey: mods.has('shift'),
  });
  if (!norm) throw new Error(`Not a shortcut: "${written}"`);
  return norm;
}

const IS_MAC = typeof navigator !== 'undefined' && /Mac|iPhone|iPad/.test(navigator.platform ?? '');

const DISPLAY: Record<string, string> = {
  ArrowLeft: '←',
  ArrowRight: '→',
  ArrowUp: '↑',
  ArrowDown: '↓',
  Delete: 'Del',
  Backspace: '⌫',
  Escape: 'Esc',
  // Shifted brackets, written as the keys pressed (US layout).
  '}': 'Shift+]',
  '{': 'Shift+[',
};

/** Human form for menus and the help panel ("Ctrl+Z" / "⌘Z"). */
export function displayShortcut(canonical: string, mac = IS_MAC): string {
  return splitShortcut(canonical)
    .map((p) => {
      if (p === 'Mod') return mac ? '⌘' : 'Ctrl';
      if (p === 'Alt') return mac ? '⌥' : 'Alt';
      if (p === 'Shift') return mac ? '⇧' : 'Shift';
      return DISPLAY[p] ?? p;
    })
    .join(mac ? '' : '+');
}

/** True when a key event comes from a text field, where letters must type, not run tools. */
export function isTypingTarget(target: EventTarget | null): boolean {
  if (!target || typeof (target as HTMLElement).tagName !== 'string') return false;
  const el = target as HTMLElement;
  const tag = el.tagName.toLowerCase();
  if (tag === 'textarea' || tag === 'select' || el.isContentEditable) return true;
  if (tag !== 'input') return false;
  const type = (el as HTMLInputElement).type;
  return !['checkbox', 'radio', 'button', 'range', 'submit', 'reset'].includes(type);
}
