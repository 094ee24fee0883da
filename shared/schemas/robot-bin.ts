export interface BinnedRobot {
  id: string;
  name: string;
  headRevision: number;
  deletedAt: string;
  deletedByName: string | null;
  /** After this moment the robot can no longer be restored. */
  restorableUntil: string;
}
