import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { computeMixing } from '@shared/kinematics/mixing';
import { MixingMatrixTable, rankWords } from '@/features/robot-editor/components/mixing-matrix-table';
import { makeConfig } from '../../../factories/engine';

describe('the mixing matrix table', () => {
  it('shows each motor’s command for each stick, signed', () => {
    render(<MixingMatrixTable mixing={computeMixing(makeConfig('trio-omni'))} />);
    const rearLeft = screen.getByRole('row', { name: /^Rear left/ });
    expect(
      within(rearLeft)
        .getAllByRole('cell')
        .map((c) => c.textContent),
    ).toEqual(['+1.00', '\u22120.50', '+1.00']);
  });

  it('says in words that a differential pair ignores its strafe stick', () => {
    const mixing = computeMixing(makeConfig('differential'));
    render(<MixingMatrixTable mixing={mixing} />);
    expect(screen.getByText(rankWords(mixing))).toBeTruthy();
    expect(rankWords(mixing)).toBe('Rank 2: it can drive and turn; one stick is ignored.');
    expect(screen.getByText(mixing.notes[0])).toBeTruthy();
  });

  it('calls a base that moves freely rank 3', () => {
    expect(rankWords(computeMixing(makeConfig('quad-mecanum')))).toMatch(/^Rank 3: it can drive, strafe and turn/);
  });
});
