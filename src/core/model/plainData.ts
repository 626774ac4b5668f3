/**
 * Structural equality of plain data (objects, arrays, strings, numbers, booleans, null), as the
 * editing model is made of. Stops at the first difference and builds nothing, so comparing two
 * derived netlists of a 5,000-transistor sheet costs a walk over their fields, not a serialisation.
 * NaN equals NaN here: both mean "no value" in the model.
 */
export function samePlainData(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) {
    return typeof a === 'number' && typeof b === 'number' && Number.isNaN(a) && Number.isNaN(b);
  }
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  if (Array.isArray(a) && Array.isArray(b)) {
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (!samePlainData(a[i], b[i])) return false;
    return true;
  }
  const ka = Object.keys(a);
  if (ka.length !== Object.keys(b).length) return false;
  const ra = a as Record<string, unknown>;
  const rb = b as Record<string, unknown>;
  for (const k of ka) if (!Object.hasOwn(rb, k) || !samePlainData(ra[k], rb[k])) return false;
  return true;
}
