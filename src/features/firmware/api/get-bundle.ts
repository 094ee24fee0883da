/**
 * Where the browser downloads a saved revision's zip. A plain link (the session cookie goes
 * with it) lets the browser stream the file and name it from the server's Content-Disposition.
 */
export function bundleUrl(robotId: string, revision: number): string {
  return `/api/robots/${encodeURIComponent(robotId)}/revisions/${revision}/bundle`;
}
