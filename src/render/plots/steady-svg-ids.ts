// vega numbers the gradients it draws with a counter kept for the whole
// process (gradient_0, gradient_1, ...), so the same chart drawn second in a
// process would differ from the same chart drawn first. Numbered afresh in
// each file, in the order they first appear, the same chart gives the same bytes.

export function steadySvgIds(svg: string): string {
  const fresh = new Map<string, string>();
  return svg.replace(/\bgradient_\d+\b/g, (id) => fresh.get(id) ?? fresh.set(id, `gradient_${fresh.size}`).get(id)!);
}
