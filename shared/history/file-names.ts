/** Lower-case ASCII words joined by underscores: "Géraldine's Cart" → "geraldine_s_cart". */
export function robotSlug(name: string): string {
  const slug = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '_')
    .replace(/^_+|_+$/g, '');
  return slug || 'robot';
}

/** The exported configuration's file name: robot slug and revision, e.g. `greenhouse_cart-r3.json`. */
export function configFileName(robotName: string, revision: number): string {
  return `${robotSlug(robotName)}-r${revision}.json`;
}
