import { randomBytes } from 'node:crypto';
import { count, eq } from 'drizzle-orm';
import type { Db } from '@server/db/client';
import { auditEvents, flashes, memberships, revisions, robots, teams, users } from '@server/db/schema';
import { newId } from '@server/lib/ids';
import { hashPassword, type PasswordCost } from '@server/lib/password';
import { RobotConfigSchema, type RobotConfig } from '@shared/schemas/robot-config';
import type { Role } from '@shared/schemas/teams';
import { demoRobotConfigs } from './demo-robots';

// The demo: the Larkspur Makers Club, a school robotics club. Invented people and builds.

export const DEMO_TEAM_NAME = 'Larkspur Makers Club';

export const DEMO_PEOPLE: {
  key: 'mentor' | 'lead' | 'parent';
  name: string;
  email: string;
  role: Role;
  label: string;
}[] = [
  {
    key: 'mentor',
    name: 'Maren Holloway',
    email: 'mentor@larkspur-makers.example',
    role: 'owner',
    label: 'club mentor',
  },
  {
    key: 'lead',
    name: 'Jonah Pell',
    email: 'student.lead@larkspur-makers.example',
    role: 'editor',
    label: 'student lead',
  },
  {
    key: 'parent',
    name: 'Ruth Adebayo',
    email: 'visiting.parent@larkspur-makers.example',
    role: 'viewer',
    label: 'visiting parent',
  },
];

type Person = (typeof DEMO_PEOPLE)[number]['key'];

interface Step {
  daysAgo: number;
  by: Person;
  message: string;
  change: (config: RobotConfig) => void;
}

/** Later revisions of each robot, in the order the club made them. */
const HISTORY: Record<
  string,
  { createdDaysAgo: number; steps: Step[]; flash: { revision: number; daysAgo: number; by: Person; note: string } }
> = {
  'Greenhouse Cart': {
    createdDaysAgo: 41,
    steps: [
      {
        daysAgo: 38,
        by: 'lead',
        message: 'Trim PPM end points after the bench check',
        change: (c) => endPoints(c, 1012, 1988),
      },
      {
        daysAgo: 30,
        by: 'lead',
        message: 'Softer yaw for turning between the seed trays',
        change: (c) => (c.controls.axes.yaw.expo = 0.5),
      },
      {
        daysAgo: 12,
        by: 'mentor',
        message: 'Gentler ramp so the water tank does not slosh',
        change: (c) => (c.safety.rampPerSecond = 2.5),
      },
    ],
    flash: { revision: 3, daysAgo: 29, by: 'lead', note: 'Before the spring plant sale' },
  },
  'Aisle Scout': {
    createdDaysAgo: 27,
    steps: [
      {
        daysAgo: 25,
        by: 'lead',
        message: 'Rear right motor is mounted the other way round',
        change: (c) => (c.chassis.wheels[2].reversed = true),
      },
      {
        daysAgo: 9,
        by: 'lead',
        message: 'Wider deadband: the strafe stick creeps',
        change: (c) => (c.controls.axes.strafe.deadband = 0.07),
      },
    ],
    flash: { revision: 2, daysAgo: 24, by: 'mentor', note: 'Club night demo' },
  },
  'Garden Hauler': {
    createdDaysAgo: 60,
    steps: [
      {
        daysAgo: 52,
        by: 'mentor',
        message: 'Shorter failsafe after the hauler rolled on at the fence',
        change: (c) => (c.safety.failsafeTimeoutMs = 150),
      },
      {
        daysAgo: 20,
        by: 'lead',
        message: 'Cap output at 70 % for the younger drivers',
        change: (c) => (c.safety.outputLimitPercent = 70),
      },
    ],
    flash: { revision: 3, daysAgo: 19, by: 'mentor', note: 'Taken to the allotment open day' },
  },
  'Bench Kiwi': {
    createdDaysAgo: 8,
    steps: [
      {
        daysAgo: 3,
        by: 'lead',
        message: 'Move the link to RF channel 100, away from the school Wi-Fi',
        change: (c) => (c.controls.link.rfChannel = 100),
      },
    ],
    flash: { revision: 1, daysAgo: 6, by: 'lead', note: 'First drive on the bench' },
  },
};

function endPoints(config: RobotConfig, low: number, high: number): void {
  for (const channel of config.controls.channels.slice(0, 4)) {
    channel.low = low;
    channel.high = high;
  }
}

const daysAgo = (days: number, now: number) => new Date(now - days * 86_400_000);

/** A readable random password: 12 characters from 9 random bytes. */
function demoPassword(): string {
  return randomBytes(9).toString('base64url');
}

export interface SeededAccount {
  name: string;
  email: string;
  role: Role;
  label: string;
  password: string;
}

export function isDatabaseEmpty(db: Db): boolean {
  return (db.select({ n: count() }).from(users).get()?.n ?? 0) === 0;
}

/** Seeds the demo club. Returns the accounts with their one-time-shown passwords. */
export async function seedDemo(
  db: Db,
  options: { passwordCost?: PasswordCost; now?: number } = {},
): Promise<SeededAccount[]> {
  const now = options.now ?? Date.now();
  const accounts = await Promise.all(
    DEMO_PEOPLE.map(async (person) => {
      const password = demoPassword();
      return { ...person, id: newId(), password, passwordHash: await hashPassword(password, options.passwordCost) };
    }),
  );
  const idOf = (key: Person) => accounts.find((a) => a.key === key)!.id;

  db.transaction((tx) => {
    for (const a of accounts) {
      tx.insert(users)
        .values({ id: a.id, email: a.email, name: a.name, passwordHash: a.passwordHash, createdAt: daysAgo(70, now) })
        .run();
    }
    const teamId = newId();
    tx.insert(teams)
      .values({ id: teamId, name: DEMO_TEAM_NAME, createdBy: idOf('mentor'), createdAt: daysAgo(70, now) })
      .run();
    for (const a of accounts) {
      tx.insert(memberships)
        .values({ teamId, userId: a.id, role: a.role, createdAt: daysAgo(a.key === 'mentor' ? 70 : 65, now) })
        .run();
    }
    for (const base of demoRobotConfigs()) {
      seedRobot(tx, { teamId, base, now, idOf });
    }
  });
  return accounts.map(({ name, email, role, label, password }) => ({ name, email, role, label, password }));
}

function seedRobot(
  db: Db,
  input: { teamId: string; base: RobotConfig; now: number; idOf: (key: Person) => string },
): void {
  const { teamId, base, now, idOf } = input;
  const history = HISTORY[base.name];
  if (!history) throw new Error(`No demo history for "${base.name}"`);
  const robotId = newId();
  const created = daysAgo(history.createdDaysAgo, now);
  db.insert(robots)
    .values({ id: robotId, teamId, name: base.name, createdBy: idOf('mentor'), createdAt: created, headRevision: 0 })
    .run();

  const steps = [
    {
      daysAgo: history.createdDaysAgo,
      by: 'mentor' as Person,
      message: 'First revision from a starter layout',
      change: () => {},
    },
    ...history.steps,
  ];
  let config = base;
  steps.forEach((step, index) => {
    const next = structuredClone(config);
    step.change(next);
    config = RobotConfigSchema.parse(next);
    const at = daysAgo(step.daysAgo, now);
    db.insert(revisions)
      .values({
        robotId,
        number: index + 1,
        config: JSON.stringify(config),
        message: step.message,
        authorId: idOf(step.by),
        createdAt: at,
      })
      .run();
    const action = index === 0 ? 'robot.created' : 'revision.saved';
    db.insert(auditEvents)
      .values({
        teamId,
        actorId: idOf(step.by),
        action,
        target: `robot:${robotId}`,
        detail: JSON.stringify({ name: base.name, number: index + 1, message: step.message }),
        createdAt: at,
      })
      .run();
  });
  db.update(robots).set({ headRevision: steps.length }).where(eq(robots.id, robotId)).run();
  db.insert(flashes)
    .values({
      robotId,
      revisionNumber: history.flash.revision,
      flashedAt: daysAgo(history.flash.daysAgo, now),
      flashedBy: idOf(history.flash.by),
      note: history.flash.note,
    })
    .run();
}

/** The console lines shown once, after seeding. */
export function describeSeededAccounts(accounts: SeededAccount[], appUrl: string): string {
  const width = Math.max(...accounts.map((a) => a.email.length));
  return [
    `Seeded the demo team "${DEMO_TEAM_NAME}". Sign in at ${appUrl}/sign-in with:`,
    ...accounts.map((a) => `  ${a.email.padEnd(width)}  ${a.password}  (${a.role}, ${a.label}: ${a.name})`),
    'These passwords are shown only now. Lost them? Use "Forgot your password?"; in development the link appears at /dev/mailbox.',
  ].join('\n');
}
