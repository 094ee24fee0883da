// Which editor section shows a field, by the first key of its path.
const SECTION_OF_ROOT: Record<string, string> = {
  name: 'chassis',
  chassis: 'chassis',
  motors: 'chassis',
  controls: 'controls',
  wiring: 'wiring',
  safety: 'safety',
  power: 'safety',
  firmware: 'firmware',
};

/**
 * A link (relative to the current section's path) that opens the section showing the field and
 * asks it to focus the field: `../wiring?field=wiring.drivers.0.pins.a.en.pin`.
 */
export function fieldLink(path: readonly (string | number)[]): string | null {
  const section = SECTION_OF_ROOT[String(path[0])];
  if (!section) return null;
  return `../${section}?field=${encodeURIComponent(path.join('.'))}`;
}
