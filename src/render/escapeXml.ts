/**
 * Text safe inside an XML element or a double-quoted attribute.
 * @example escapeXml('a < b & "c"') // => "a &lt; b &amp; &quot;c&quot;"
 */
export function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}
