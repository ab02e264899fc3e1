/** Ids for new entries, made from their names. Pure. */

/** An id from a name: lower case, [a-z0-9._-], at most 64 characters, unique under `taken`. */
export function makeId(name: string, taken: (id: string) => boolean): string {
  let base = name
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9._-]+/g, "-")
    .replace(/^[^a-z0-9]+/, "")
    .replace(/-+$/, "")
    .slice(0, 56);
  if (base === "" || base === "constructor" || base === "prototype") base = `entry${base ? `-${base}` : ""}`;
  let id = base;
  for (let n = 2; taken(id); n++) id = `${base}-${n}`;
  return id;
}
