/** Text placed in HTML content or a double-quoted attribute, shown literally: no markup can form from it. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]!);
}

/** An id attribute for an anchor other text links to; characters outside a plain set are replaced. */
export function anchorId(prefix: string, id: string): string {
  return `${prefix}-${id.replace(/[^A-Za-z0-9._-]/g, '_')}`;
}
