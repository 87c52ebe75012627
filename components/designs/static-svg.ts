import { Fragment, isValidElement, type ReactElement, type ReactNode } from 'react';

/**
 * The markup of a static SVG drawing (a tree of SVG elements and plain function components such as
 * FieldSvg and DesignShapes: no hooks, no context, no event handlers) as a standalone document string.
 *
 * Why not react-dom/server: Next's server bundle for route handlers refuses its string renderers, and a
 * picture served as its own file (cacheable for ever, shared by every viewer of a link) needs exactly
 * this one string. The test beside this file checks the output against react-dom/server's own for the
 * share page's pictures, so both stay the same drawing.
 */
export function staticSvg(node: ReactNode): string {
  const out: string[] = [];
  write(node, out, false);
  return out.join('');
}

/**
 * The same for a piece of a page made of HTML elements and plain function components (a species check,
 * a list of cautions): its markup as React's renderToStaticMarkup writes it, to be held and sent again
 * as it is. Refuses what it does not write as React does (camelCase attributes other than className,
 * styles, inner HTML), so it can only ever be exact or fail.
 */
export function staticHtml(node: ReactNode): string {
  const out: string[] = [];
  write(node, out, true);
  return out.join('');
}

// HTML elements that have no end tag (React writes `<br/>`).
const VOID = new Set([
  'area',
  'base',
  'br',
  'col',
  'embed',
  'hr',
  'img',
  'input',
  'link',
  'meta',
  'source',
  'track',
  'wbr',
]);

// React writes these SVG attributes as given; every other camelCase prop becomes kebab-case
// (strokeWidth → stroke-width), as React does for SVG presentation attributes.
const KEEP_CASE = new Set([
  'viewBox',
  'preserveAspectRatio',
  'gradientUnits',
  'gradientTransform',
  'patternUnits',
]);
const RENAMED: Record<string, string> = { className: 'class', htmlFor: 'for' };
const SKIPPED = new Set(['children', 'key', 'ref', 'dangerouslySetInnerHTML', 'suppressHydrationWarning']);

// The same escapes as React's, in text and attributes alike.
const ESCAPES: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#x27;',
};
const escape = (s: string) => s.replace(/[&<>"']/g, (c) => ESCAPES[c]!);

function attributeName(prop: string): string {
  if (RENAMED[prop]) return RENAMED[prop];
  if (KEEP_CASE.has(prop) || prop.startsWith('data-') || prop.startsWith('aria-')) return prop;
  return prop.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);
}

function styleText(style: Record<string, string | number>): string {
  return Object.entries(style)
    .filter(([, v]) => v !== null && v !== undefined && v !== '')
    .map(([k, v]) => `${k.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`)}:${v}`)
    .join(';');
}

function write(node: ReactNode, out: string[], html: boolean): void {
  if (node === null || node === undefined || typeof node === 'boolean') return;
  if (typeof node === 'string' || typeof node === 'number' || typeof node === 'bigint') {
    out.push(escape(String(node)));
    return;
  }
  if (Array.isArray(node)) {
    // React puts a comment between adjacent text nodes only when hydrating; a static string needs none.
    for (const child of node) write(child as ReactNode, out, html);
    return;
  }
  if (!isValidElement(node)) throw new Error('staticSvg: only elements, text and arrays can be drawn');
  const element = node as ReactElement<Record<string, unknown>>;
  const { type, props } = element;
  if (type === Fragment) return write(props.children as ReactNode, out, html);
  if (typeof type === 'function') {
    // A plain function component (no hooks): its output is the drawing.
    return write((type as (p: Record<string, unknown>) => ReactNode)(props), out, html);
  }
  if (typeof type !== 'string') throw new Error('staticSvg: only SVG elements and function components');
  out.push(`<${type}`);
  for (const [prop, value] of Object.entries(props)) {
    if (typeof value === 'function') throw new Error(`staticSvg: <${type} ${prop}> is an event handler`);
    if (
      html &&
      value != null &&
      !RENAMED[prop] &&
      (prop === 'style' ||
        prop === 'dangerouslySetInnerHTML' ||
        (/^[a-z]+[A-Z]/.test(prop) && !SKIPPED.has(prop)))
    ) {
      throw new Error(`staticHtml: <${type} ${prop}> is not written as React would`);
    }
    // React writes `false` out in aria-* and data-* attributes and leaves other attributes out.
    const spelt = value === false && (prop.startsWith('aria-') || prop.startsWith('data-'));
    if (SKIPPED.has(prop) || value === null || value === undefined || (value === false && !spelt)) continue;
    const text =
      prop === 'style' && typeof value === 'object'
        ? styleText(value as Record<string, string | number>)
        : value === true
          ? ''
          : String(value);
    out.push(` ${attributeName(prop)}="${escape(text)}"`);
  }
  if (html && VOID.has(type)) {
    out.push('/>');
    return;
  }
  // An explicit end tag on every other element, as React writes them (valid XML either way).
  out.push('>');
  write(props.children as ReactNode, out, html);
  out.push(`</${type}>`);
}
