const XML_ESCAPES: Readonly<Record<string, string>> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&apos;',
  // In an attribute a parser turns raw tabs and line breaks into spaces; references keep them.
  '\t': '&#9;',
  '\n': '&#10;',
  '\r': '&#13;',
};

/**
 * Characters XML 1.0 cannot hold at all, not even as references: the C0 controls other than tab,
 * line feed and carriage return, unpaired surrogates, and U+FFFE / U+FFFF. They are shown as a
 * visible `\uXXXX` instead, so the report stays well-formed whatever an implementation printed.
 */
const NOT_XML = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

function visible(text: string): string {
  return text.replace(NOT_XML, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}

/** Text for XML element content. */
export function xmlText(text: string): string {
  return visible(text).replace(/[&<>]/g, (c) => XML_ESCAPES[c]);
}

/** Text for a double-quoted XML attribute value, line breaks and tabs kept. */
export function xmlAttribute(text: string): string {
  return visible(text).replace(/[&<>"'\t\n\r]/g, (c) => XML_ESCAPES[c]);
}
