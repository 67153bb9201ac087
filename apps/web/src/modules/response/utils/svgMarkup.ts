// A stand-alone SVG document of a plot, with the theme's colours written in so it looks the same outside the app.

/** Style properties copied from the page onto each element of the exported copy. */
const COPIED = ['fill', 'fill-opacity', 'stroke', 'stroke-width', 'stroke-opacity', 'stroke-dasharray', 'opacity', 'font-family', 'font-size', 'font-weight', 'text-anchor', 'dominant-baseline'] as const;

/**
 * The markup of `svg` as a file: a deep copy with every element's computed paint and font inlined (CSS variables
 * and theme classes do not travel with the file), the namespace set, and a background of `background`.
 */
export function svgMarkup(svg: SVGSVGElement, background: string): string {
  const copy = svg.cloneNode(true) as SVGSVGElement;
  const sources = [svg, ...Array.from(svg.querySelectorAll('*'))];
  const targets = [copy, ...Array.from(copy.querySelectorAll('*'))];
  sources.forEach((source, i) => {
    const target = targets[i];
    if (!(target instanceof Element)) return;
    const style = window.getComputedStyle(source);
    const inline = COPIED.map((p) => [p, style.getPropertyValue(p)] as const).filter(([, v]) => v !== '');
    if (inline.length > 0) target.setAttribute('style', inline.map(([p, v]) => `${p}:${v}`).join(';'));
  });
  copy.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  copy.querySelectorAll('[data-export="skip"]').forEach((el) => el.remove());
  const box = copy.getAttribute('viewBox')?.split(/\s+/).map(Number) ?? [0, 0, 0, 0];
  const rect = document.createElementNS('http://www.w3.org/2000/svg', 'rect');
  rect.setAttribute('x', String(box[0] ?? 0));
  rect.setAttribute('y', String(box[1] ?? 0));
  rect.setAttribute('width', String(box[2] ?? 0));
  rect.setAttribute('height', String(box[3] ?? 0));
  rect.setAttribute('fill', background);
  copy.insertBefore(rect, copy.firstChild);
  return `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(copy)}`;
}
