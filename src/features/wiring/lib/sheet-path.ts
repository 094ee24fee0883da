/** The printable wiring sheet of one revision (the route is registered in src/app/router.tsx). */
export function wiringSheetPath(teamId: string, robotId: string, revision?: number): string {
  const base = `/teams/${encodeURIComponent(teamId)}/robots/${encodeURIComponent(robotId)}/wiring-sheet`;
  return revision === undefined ? base : `${base}?revision=${revision}`;
}
