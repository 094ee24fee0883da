/** One reason a configuration cannot become firmware, with the field to show. */
export interface FirmwareIssue {
  path: (string | number)[];
  message: string;
}

/** Thrown when the configuration cannot be generated; lists every reason found. */
export class FirmwareConfigError extends Error {
  constructor(readonly issues: FirmwareIssue[]) {
    super(`The firmware cannot be generated:\n${issues.map((i) => `  ${i.path.join('.')}: ${i.message}`).join('\n')}`);
    this.name = 'FirmwareConfigError';
  }
}

/** Collects issues while the model is built, so the user sees them all at once. */
export class IssueList {
  readonly issues: FirmwareIssue[] = [];

  /** Adds an issue unless one is already listed for the same field. */
  add(path: (string | number)[], message: string): void {
    const key = path.join('.');
    if (this.issues.some((i) => i.path.join('.') === key)) return;
    this.issues.push({ path, message });
  }

  throwIfAny(): void {
    if (this.issues.length > 0) throw new FirmwareConfigError(this.issues);
  }
}
