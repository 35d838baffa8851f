// Layout checks run inside the page: horizontal overflow, content wider than its card, overlapping text, and the
// height the fixed chrome takes. Each returns plain descriptions so a failing test says what and where.
import type { Page } from 'playwright-core';

/** Everything that sticks out sideways: the document itself, elements past the window's edges, card contents. */
export async function horizontalOverflow(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const problems: string[] = [];
    const doc = document.documentElement;
    if (doc.scrollWidth > window.innerWidth) problems.push(`page is ${doc.scrollWidth}px wide in ${window.innerWidth}`);
    const name = (el: Element) => {
      const id = el.closest('[data-testid]')?.getAttribute('data-testid') ?? el.tagName.toLowerCase();
      const words = (el.textContent ?? '').trim().slice(0, 30);
      return words ? `${id} “${words}”` : id;
    };
    const scrollsSideways = (el: Element) => {
      const s = getComputedStyle(el);
      return (s.overflowX === 'auto' || s.overflowX === 'scroll') && el.scrollWidth > el.clientWidth;
    };
    // True when something between `el` (exclusive) and `stop` (exclusive) scrolls sideways: content there may be
    // wider on purpose, and the scroller itself is checked instead.
    const insideScroller = (el: Element, stop: Element | null) => {
      for (let p = el.parentElement; p && p !== stop; p = p.parentElement) if (scrollsSideways(p)) return true;
      return false;
    };
    // True when an ancestor between `el` and `stop` clips sideways (an SVG drawing, a rounded map): what is cut off
    // there is cut on purpose, and the clipping box itself is checked instead.
    const insideClip = (el: Element, stop: Element | null) => {
      for (let p = el.parentElement; p && p !== stop; p = p.parentElement) {
        const x = getComputedStyle(p).overflowX;
        if (x === 'hidden' || x === 'clip') return true;
      }
      return false;
    };
    const visible = (el: Element) => {
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0) return false;
      const s = getComputedStyle(el);
      return s.visibility !== 'hidden' && s.display !== 'none' && Number(s.opacity) > 0;
    };
    for (const el of document.body.querySelectorAll('*')) {
      if (!visible(el) || insideScroller(el, null) || insideClip(el, null)) continue;
      const r = el.getBoundingClientRect();
      if (r.right > window.innerWidth + 1 || r.left < -1) {
        problems.push(`${name(el)} spans ${Math.round(r.left)}–${Math.round(r.right)} in ${window.innerWidth}`);
        break;
      }
    }
    for (const card of document.querySelectorAll('[data-card="true"]')) {
      if (!visible(card)) continue;
      const box = card.getBoundingClientRect();
      for (const el of card.querySelectorAll('*')) {
        if (!visible(el) || insideScroller(el, card) || insideClip(el, card)) continue;
        const r = el.getBoundingClientRect();
        if (r.right > box.right + 1 || r.left < box.left - 1) {
          problems.push(`${name(el)} is wider than its card ${name(card)}`);
          break;
        }
      }
    }
    return problems;
  });
}

/**
 * Pairs of text runs whose boxes overlap on screen. Boxes are the text's own glyph boxes (a Range around each text
 * node), clipped to whatever clips them, so text scrolled out of a scroller does not count.
 */
export async function overlappingText(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    type Box = { left: number; top: number; right: number; bottom: number; text: string; owner: Element; node: Node };
    const clip = (el: Element, r: DOMRect) => {
      let box = { left: r.left, top: r.top, right: r.right, bottom: r.bottom };
      for (let p: Element | null = el; p; p = p.parentElement) {
        const s = getComputedStyle(p);
        if (s.overflowX === 'visible' && s.overflowY === 'visible') continue;
        const c = p.getBoundingClientRect();
        box = {
          left: Math.max(box.left, c.left),
          top: Math.max(box.top, c.top),
          right: Math.min(box.right, c.right),
          bottom: Math.min(box.bottom, c.bottom),
        };
      }
      return box;
    };
    // Something opaque drawn over the text (a scroll row's edge fade, a sticky header) hides it: text there is
    // not on screen, so it cannot overprint anything.
    const opaque = (el: Element) => {
      const bg = getComputedStyle(el).backgroundColor;
      return bg !== 'transparent' && !/rgba\(.*, 0\)$/.test(bg);
    };
    const hiddenAt = (owner: Element, x: number, y: number) => {
      const top = document.elementFromPoint(x, y);
      if (!top || owner.contains(top) || top.contains(owner)) return false;
      for (let p: Element | null = top; p && !p.contains(owner); p = p.parentElement) if (opaque(p)) return true;
      return false;
    };
    const boxes: Box[] = [];
    const walker = document.createTreeWalker(document.body, NodeFilter.SHOW_TEXT);
    for (let node = walker.nextNode(); node; node = walker.nextNode()) {
      const text = (node.textContent ?? '').trim();
      const parent = node.parentElement;
      if (!text || !parent) continue;
      const style = getComputedStyle(parent);
      if (style.visibility === 'hidden' || Number(style.opacity) === 0) continue;
      const range = document.createRange();
      range.selectNodeContents(node);
      // One box per line, so a wrapped sentence is not one big rectangle over its neighbours.
      for (const r of range.getClientRects()) {
        if (r.width < 1 || r.height < 1) continue;
        const b = clip(parent, r);
        if (b.right - b.left > 1 && b.bottom - b.top > 1) boxes.push({ ...b, text, owner: parent, node });
      }
    }
    const problems: string[] = [];
    // Glyph boxes include the line's leading; a couple of pixels of touching is not an overlap.
    const slack = 2;
    for (let i = 0; i < boxes.length; i++) {
      const a = boxes[i];
      if (!a) continue;
      for (let j = i + 1; j < boxes.length; j++) {
        const b = boxes[j];
        // One text node can give more than one box (a line and its ellipsis): those are not two labels.
        if (!b || b.node === a.node) continue;
        const w = Math.min(a.right, b.right) - Math.max(a.left, b.left);
        const h = Math.min(a.bottom, b.bottom) - Math.max(a.top, b.top);
        if (w <= slack || h <= slack) continue;
        const x = (Math.max(a.left, b.left) + Math.min(a.right, b.right)) / 2;
        const y = (Math.max(a.top, b.top) + Math.min(a.bottom, b.bottom)) / 2;
        if (hiddenAt(a.owner, x, y) || hiddenAt(b.owner, x, y)) continue;
        const at = (r: Box) =>
          `${Math.round(r.left)},${Math.round(r.top)}–${Math.round(r.right)},${Math.round(r.bottom)}`;
        problems.push(`“${a.text.slice(0, 30)}” at ${at(a)} overlaps “${b.text.slice(0, 30)}” at ${at(b)}`);
      }
      if (problems.length > 5) break;
    }
    return problems;
  });
}

/** Pixels of the window's height taken by the fixed header, tab row and bottom bar of a trip screen. */
export async function tripChromeHeight(page: Page): Promise<number> {
  return page.evaluate(() => {
    const body = document.querySelector('[data-testid="trip-body"]');
    if (!body) throw new Error('no trip body on this page');
    return window.innerHeight - body.getBoundingClientRect().height;
  });
}
