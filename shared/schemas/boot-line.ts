import { z } from 'zod';

export const BootLineInputSchema = z.object({
  line: z
    .string({ error: 'Paste the boot line' })
    .trim()
    .min(1, 'Paste the boot line')
    .max(4000, 'At most 4000 characters'),
});
export type BootLineInput = z.input<typeof BootLineInputSchema>;

export type BootLineMatch = {
  number: number;
  message: string;
  createdAt: string;
  isHead: boolean;
};

export interface BootLineAnswer {
  parsed: { device: 'robot' | 'remote'; robotName: string; revision: number; hash: string };
  /** The revision whose configuration has the printed hash (the printed number first), or null. */
  match: BootLineMatch | null;
  /** Other revisions with the same configuration (a restore copies one). */
  sameConfiguration: number[];
  headRevision: number;
  /** One or two sentences for the person at the bench. */
  verdict: string;
  /** Whether the robot name in the line is this robot's name. */
  nameMatches: boolean;
}

/** Which of a team's robots a pasted boot line belongs to. */
export interface TeamBootLineAnswer {
  parsed: BootLineAnswer['parsed'];
  /** The robot the line belongs to, or null when no robot in the team matches. */
  robot: { id: string; name: string } | null;
  /** How the robot was found: a revision with the printed hash, or only the printed name. */
  foundBy: 'hash' | 'name' | null;
  /** The same answer the robot's own lookup gives, or null with no robot. */
  answer: BootLineAnswer | null;
  /** Other robots of the team with a revision of the same configuration (a copied robot). */
  otherRobots: { id: string; name: string }[];
  /** One sentence on how the robot was found, or why none was. */
  verdict: string;
}
