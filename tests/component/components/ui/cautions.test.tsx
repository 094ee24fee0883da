import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { Cautions } from '@/components/ui/cautions';
import { SAFETY_CAUTIONS } from '@shared/safety/cautions';

afterEach(cleanup);

describe('the cautions panel', () => {
  it('is a labelled region listing every caution', () => {
    render(<Cautions />);
    const region = screen.getByRole('complementary', { name: 'Before the wheels turn' });
    expect(
      within(region)
        .getAllByRole('listitem')
        .map((li) => li.textContent),
    ).toEqual([...SAFETY_CAUTIONS]);
  });
});
