import type { Problem } from '@shared/problems/problem';
import { targetFor } from './wiring-problems';

/**
 * Takes the builder to the field a problem points at: scrolls it into view, focuses it and
 * marks it for a moment (data-flash) so the eye finds it.
 */
export function focusProblemField(path: Problem['path'], doc: Document = document): HTMLElement | null {
  const id = targetFor(path, (candidate) => doc.getElementById(candidate) !== null);
  const element = doc.getElementById(id);
  if (!element) return null;
  element.scrollIntoView?.({ block: 'center', behavior: 'smooth' });
  element.focus({ preventScroll: true });
  const flashed = element.closest<HTMLElement>('[data-flash-target]') ?? element;
  flashed.dataset.flash = 'on';
  window.setTimeout(() => delete flashed.dataset.flash, 2400);
  return element;
}
