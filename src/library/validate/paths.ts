/** Paths in validation messages, written the way a person reads them: substances[3].aliases[0]. */

export function childPath(parent: string, key: string | number): string {
  if (typeof key === "number") return `${parent}[${key}]`;
  const plain = /^[A-Za-z_$][A-Za-z0-9_$]*$/.test(key) || /^[a-z0-9][a-z0-9._-]*$/.test(key);
  const part = plain ? key : JSON.stringify(key);
  if (parent === "") return plain ? part : `[${part}]`;
  return plain ? `${parent}.${part}` : `${parent}[${part}]`;
}

/** "substances[3].aliases[0]: duplicate …" — the root reads "(file)". */
export function formatIssue(issue: { path: string; message: string }): string {
  return `${issue.path === "" ? "(file)" : issue.path}: ${issue.message}`;
}

/** A value quoted for a message, shortened. */
export function quote(value: unknown): string {
  if (value === undefined) return "nothing";
  let text: string;
  try {
    text = JSON.stringify(value) ?? String(value);
  } catch {
    text = String(value);
  }
  return text.length > 60 ? `${text.slice(0, 57)}…` : text;
}
