// Checks shared by the templates: each error names the field so a caller bug is quick to find.

// Escaping alone does not stop `javascript:` links, so a link must be absolute http(s).
export function requireHttpUrl(value: string, field: string): string {
  let url: URL;
  try {
    url = new URL(value);
  } catch {
    throw new Error(`${field} must be an absolute URL, got "${value}"`);
  }
  if (url.protocol !== "https:" && url.protocol !== "http:") {
    throw new Error(`${field} must be an http(s) URL, got "${url.protocol}"`);
  }
  return url.toString();
}

/** Names end up in the Subject header, where a line break is not allowed. */
export function requireLine(value: string, field: string): string {
  return requireText(value, field).replace(/\s+/g, " ");
}

export function requireText(value: string, field: string): string {
  const trimmed = value.trim();
  if (trimmed === "") throw new Error(`${field} must not be empty`);
  return trimmed;
}
