import type { Problem } from '@shared/problems/problem';
import type { RobotConfig } from '@shared/schemas/robot-config';
import type { RobotDetail } from '@shared/schemas/robots';

/** What every section of the robot editor receives from the editor shell. */
export interface SectionProps {
  robot: RobotDetail['robot'];
  /** The head revision the draft started from. */
  head: RobotDetail['head'];
  /** The current draft (parsed, every default filled in). */
  config: RobotConfig;
  /** Replace the draft; the shell keeps it per robot (surviving a reload) and marks it unsaved. */
  onChange: (next: RobotConfig) => void;
  /** Every problem of the draft (robotProblems), errors first. */
  problems: Problem[];
  /** False for viewers: show everything, change nothing. */
  canEdit: boolean;
}
