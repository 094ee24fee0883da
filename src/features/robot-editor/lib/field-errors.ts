import type { z } from 'zod';

type Issue = z.core.$ZodIssue;

const num = (v: unknown) => (typeof v === 'bigint' ? Number(v) : (v as number));

/** A schema issue in a builder's words; messages written in the schema are kept as they are. */
export function friendlyIssue(issue: Issue): string {
  const generic = /^(Invalid input|Too small|Too big|Invalid option)/.test(issue.message);
  if (!generic) return issue.message;
  switch (issue.code) {
    case 'invalid_type':
      return issue.expected === 'int'
        ? 'Use a whole number'
        : issue.expected === 'number'
          ? 'Enter a number'
          : issue.message;
    case 'too_small':
      if (issue.origin === 'array') return `Needs at least ${num(issue.minimum)}`;
      if (issue.origin === 'string')
        return num(issue.minimum) <= 1 ? 'Cannot be empty' : `At least ${num(issue.minimum)} characters`;
      return issue.inclusive ? `Must be at least ${num(issue.minimum)}` : `Must be more than ${num(issue.minimum)}`;
    case 'too_big':
      if (issue.origin === 'array') return `At most ${num(issue.maximum)}`;
      if (issue.origin === 'string') return `At most ${num(issue.maximum)} characters`;
      return issue.inclusive ? `Must be at most ${num(issue.maximum)}` : `Must be less than ${num(issue.maximum)}`;
    case 'invalid_value':
      return 'Choose one of the offered values';
    case 'invalid_union':
      return 'Enter a valid value';
    default:
      return issue.message;
  }
}

/** The first reason per field, keyed by dotted path (`chassis.wheels.1.radiusMm`). */
export function issuesByPath(issues: readonly Issue[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join('.');
    if (!(key in out)) out[key] = friendlyIssue(issue);
  }
  return out;
}
