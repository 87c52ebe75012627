// The one inline script that shows a studio page's field picture (components/studio/FirstField.tsx).
// Not a client module: the root layout, a server component, puts its text in every page's <head>.
import { FIELD_VISIBLE_MARK } from './fields/early';

export const FIRST_FIELD_PREFS_KEY = 'baskwell.studio.prefs';
export const FIRST_FIELD_SCRATCH_KEY = 'baskwell.studio.local.scratch';
export const FIRST_FIELD_SELECTOR = '[data-testid="studio-first-field"]';
/** An empty element after the picture's drawing: once it is parsed, the whole picture is. */
export const FIRST_FIELD_END_ATTR = 'data-picture-end';
/**
 * The same element's id, named by the page's `<link rel="expect" blocking="render">`: the browser paints
 * nothing until it is parsed, so a page whose HTML arrives in parts (a busy server flushes what it has)
 * never shows a frame between the picture's first part and its last.
 */
export const FIRST_FIELD_END_ID = 'studio-first-field-end';

/**
 * The picture is sent hidden (`data-pending`) and only this script shows it, once it knows this browser
 * will not show something else (another field chosen here, fields hidden, or, on the scratch studio, a
 * design of its own): a wrong field never flashes. Errors (storage disabled) show the picture as it is.
 *
 * It must run before the page's first frame, or that frame is painted without the picture and the
 * picture comes frames later, behind the page's scripts. So it sits in the <head> as an inline module
 * script marked `blocking="render"`: a module does not wait for the stylesheet (a classic script there
 * would, and hold the parser meanwhile), and the browser renders nothing until it has run. When it runs
 * before the picture is parsed, a mutation observer catches the picture's last element; its callback
 * runs at the end of the parser's task, before the browser can render. Other pages leave at once. When the
 * picture's last element comes in the same task as the end of the document, Chromium fires
 * DOMContentLoaded within that task, before the observer's callback, so that listener looks once more
 * before it stops observing (a disconnect drops the records not yet delivered).
 *
 * A render-blocking script only holds the first frame until it has run; the picture may still be on its
 * way. The link that expects the picture's last element (FirstField.tsx) holds the frame until then.
 *
 * The mark is the moment the picture reached the screen, not when it was drawn: the first frame that
 * holds it is the one whose animation frame follows the picture's showing, and when that frame is the
 * page's first contentful paint (the usual case) the mark takes the paint's presentation time, which
 * comes after raster and compositing; when something was painted before (a frame without the picture),
 * the mark is set two frames after the picture's, by then presented.
 */
export function firstFieldScript(): string {
  const mark =
    `function mark(t){if(performance.getEntriesByName('${FIELD_VISIBLE_MARK}','mark').length)return;` +
    `try{performance.mark('${FIELD_VISIBLE_MARK}',{startTime:t})}catch(e){performance.mark('${FIELD_VISIBLE_MARK}')}}` +
    `function later(){requestAnimationFrame(function(){requestAnimationFrame(function(){mark(performance.now())})})}`;
  const onFrame =
    `requestAnimationFrame(function(){var drawn=performance.now();try{new PerformanceObserver(function(l){` +
    `l.getEntries().forEach(function(e){if(e.name==='first-contentful-paint'){if(e.startTime>=drawn)mark(e.startTime);else later()}})` +
    `}).observe({type:'paint',buffered:true})}catch(e){later()}})`;
  const show =
    `function show(s){var stale=false;` +
    `try{var p=JSON.parse(localStorage.getItem(${JSON.stringify(FIRST_FIELD_PREFS_KEY)})||'{}');` +
    `stale=p.fieldsVisible===false||!!(p.field&&p.field!==s.getAttribute('data-field'))` +
    `||(s.hasAttribute('data-scratch')&&!!localStorage.getItem(${JSON.stringify(FIRST_FIELD_SCRATCH_KEY)}))` +
    `}catch(e){}` +
    `if(stale)s.setAttribute('data-stale','');else{s.removeAttribute('data-pending');${mark}${onFrame}}}`;
  const sel = JSON.stringify(`${FIRST_FIELD_SELECTOR}[data-pending]`);
  const whole = JSON.stringify(`[${FIRST_FIELD_END_ATTR}]`);
  return (
    `if(location.pathname.indexOf('/studio')===0){${show}` +
    `var found=function(){var s=document.querySelector(${sel});if(!s||!s.querySelector(${whole}))return false;show(s);return true};` +
    `if(!found()&&document.readyState==='loading'){var o=new MutationObserver(function(){if(found())o.disconnect()});` +
    `o.observe(document,{childList:true,subtree:true});` +
    `document.addEventListener('DOMContentLoaded',function(){found();o.disconnect()})}}`
  );
}
