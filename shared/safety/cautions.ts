// The safety cautions Mixwright shows in the app and writes into every firmware bundle's README.
// Plain text so the web client, the templates and the command line can all use it.

export const CAUTIONS_TITLE = 'Before the wheels turn';

export const CAUTIONS_INTRO = 'Motors and lithium batteries can injure people and start fires.';

export const SAFETY_CAUTIONS: readonly string[] = [
  'Run every new firmware with the wheels off the ground first.',
  'The failsafe must stop the motors when the signal is lost: prove it by switching the remote off while the wheels spin.',
  'Keep a power switch within easy reach and a fuse in the battery line.',
  'Charge lithium packs only while someone watches, on a fire-safe surface, and within the limits the cells allow.',
  'Follow your local rules for radio transmitters and for vehicles in public places.',
  'A robot someone can ride on, or a heavy one, needs a proper engineering review that this tool does not give.',
];

export const CAUTIONS_FOOTER =
  'Local codes and licensed professional practice come before anything Mixwright suggests.';
