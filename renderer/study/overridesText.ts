/**
 * The Study panel's text form of a variant's overrides: "path = value" entries separated by ";" or
 * new lines, e.g. "ambient.depth = 12 m; diffuser.portCount = 6". Values that read as plain numbers
 * become numbers (SI); anything else stays a string for the scenario reader (units).
 */
export function overridesFromText(
  text: string,
): { ok: true; overrides: Record<string, unknown> } | { ok: false; message: string } {
  const overrides: Record<string, unknown> = {};
  for (const part of text.split(/[;\n]/)) {
    const entry = part.trim();
    if (entry === "") continue;
    const eq = entry.indexOf("=");
    if (eq <= 0) {
      return { ok: false, message: `"${entry}" should look like path = value, e.g. ambient.depth = 12 m` };
    }
    const path = entry.slice(0, eq).trim();
    const raw = entry.slice(eq + 1).trim();
    if (raw === "") return { ok: false, message: `${path}: no value` };
    const n = Number(raw);
    overrides[path] = raw === "true" ? true : raw === "false" ? false : Number.isFinite(n) ? n : raw;
  }
  return { ok: true, overrides };
}
