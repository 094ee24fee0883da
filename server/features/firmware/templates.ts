import { readdirSync, readFileSync } from 'node:fs';
import { basename, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import Handlebars from 'handlebars';

// One place compiles and caches the firmware templates. The data handed to a template is
// built and checked in code (firmware-model.ts); templates only place it, and helpers only
// format numbers. Output is C, Markdown and JSON, so Handlebars' HTML escaping is off: every
// user string in the data is already a sanitized identifier or an escaped literal.

export const TEMPLATE_ROOT = fileURLToPath(new URL('../../../templates/', import.meta.url));

type Template = Handlebars.TemplateDelegate;

let engine: { hb: typeof Handlebars; templates: Map<string, Template> } | undefined;

function listTemplates(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return listTemplates(path);
    return entry.name.endsWith('.hbs') ? [path] : [];
  });
}

function formatHelpers(hb: typeof Handlebars): void {
  hb.registerHelper('hex2', (value: unknown) => `0x${Number(value).toString(16).toUpperCase().padStart(2, '0')}`);
  hb.registerHelper('join', (values: unknown, separator: unknown) =>
    Array.isArray(values) ? values.join(typeof separator === 'string' ? separator : ', ') : '',
  );
  hb.registerHelper('eq', (a: unknown, b: unknown) => a === b);
  hb.registerHelper('inc', (value: unknown) => Number(value) + 1);
}

function load(): NonNullable<typeof engine> {
  const hb = Handlebars.create();
  formatHelpers(hb);
  const templates = new Map<string, Template>();
  for (const path of listTemplates(TEMPLATE_ROOT)) {
    const name = relative(TEMPLATE_ROOT, path)
      .replace(/\\/g, '/')
      .replace(/\.hbs$/, '');
    const text = readFileSync(path, 'utf8');
    if (name.startsWith('partials/')) hb.registerPartial(basename(name), text);
    else templates.set(name, hb.compile(text, { noEscape: true, strict: true }));
  }
  return { hb, templates };
}

/** Renders `templates/<name>.hbs` (name without the extension, e.g. `common/mw_sbus.h`). */
export function renderTemplate(name: string, data: object): string {
  engine ??= load();
  const template = engine.templates.get(name);
  if (!template) throw new Error(`No firmware template named ${name}`);
  return template(data);
}

/** Template names under a folder, for tests that render every static header. */
export function templateNames(prefix: string): string[] {
  engine ??= load();
  return [...engine.templates.keys()].filter((n) => n.startsWith(prefix)).sort();
}
