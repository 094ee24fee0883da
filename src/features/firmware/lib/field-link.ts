import { sectionOfPath } from '@/lib/editor-sections';

/**
 * A link (relative to the current section's path) that opens the section showing the field and
 * asks it to focus the field: `../wiring?field=wiring.drivers.0.pins.a.en.pin`.
 */
export function fieldLink(path: readonly (string | number)[]): string | null {
  const section = sectionOfPath(path);
  if (!section) return null;
  return `../${section}?field=${encodeURIComponent(path.join('.'))}`;
}
