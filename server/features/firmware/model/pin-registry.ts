import { findPin } from '@shared/boards/boards';
import type { BoardPin, BoardProfile } from '@shared/boards/board-types';
import type { IssueList } from './firmware-config-error';

/** One pin the firmware uses: its macro in mw_config.h and what the wiring table says. */
export interface PinEntry {
  macro: string;
  /** What code writes for the pin ('9', 'A0', '25'), from the board profile. */
  code: string;
  pinId: string;
  pinLabel: string;
  /** What is connected, in plain words (may hold user names: the README escapes it). */
  connects: string;
  /** The module or part it belongs to (user text). */
  part: string;
}

/** Resolves pin assignments against the board profile and collects them for the config header. */
export class PinRegistry {
  readonly entries: PinEntry[] = [];

  constructor(
    readonly board: BoardProfile,
    private readonly issues: IssueList,
  ) {}

  /**
   * The board pin for an assignment, recorded under `macro`; null (with an issue naming the
   * field) when it is missing or not a pin of this board.
   */
  use(
    pinId: string | null | undefined,
    path: (string | number)[],
    macro: string,
    connects: string,
    part: string,
    required = true,
  ): (PinEntry & { pin: BoardPin }) | null {
    if (!pinId) {
      if (required) this.issues.add(path, `No pin is chosen for ${connects}`);
      return null;
    }
    const pin = findPin(this.board, pinId);
    if (!pin) {
      this.issues.add(path, `${this.board.name} has no pin "${pinId}"`);
      return null;
    }
    const entry = { macro, code: pin.code, pinId: pin.id, pinLabel: pin.label, connects, part };
    this.entries.push(entry);
    return { ...entry, pin };
  }
}
