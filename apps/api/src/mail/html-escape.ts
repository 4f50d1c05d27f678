const entities: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Escapes text for an HTML e-mail body (names and notes are typed by people). */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => entities[c]);
}
