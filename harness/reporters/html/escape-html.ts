const HTML_ESCAPES: Readonly<Record<string, string>> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

/**
 * Text made safe for an HTML page, in element content and in quoted attribute values alike: the
 * five characters that can open markup, close an attribute or start an entity are replaced by
 * their character references. Every string that comes from an adapter, a recorded file or a
 * configuration (names, messages, parameters, labels) goes through here before it reaches the
 * page, so `<script>` in an adapter's name is shown as text, never run.
 */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => HTML_ESCAPES[c]);
}
