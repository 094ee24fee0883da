import { render } from '@testing-library/react';
import { useState, type ComponentType } from 'react';
import { MemoryRouter } from 'react-router';
import { vi } from 'vitest';
import { checkDraft } from '@/features/robot-editor/hooks/use-draft-validation';
import type { SectionProps } from '@/lib/editor-sections';
import { robotProblems } from '@shared/problems/robot-problems';
import type { RobotConfig } from '@shared/schemas/robot-config';

/**
 * A section on its own, holding the draft the way the shell does: every change goes back in,
 * the schema's reasons come back out. `latest()` is the draft after the last change.
 */
export function renderSection(
  Section: ComponentType<SectionProps>,
  initial: RobotConfig,
  options: { canEdit?: boolean } = {},
) {
  const changes = vi.fn<(next: RobotConfig) => void>();
  const requestSave = vi.fn<(message: string) => void>();
  let current = initial;
  function Host() {
    const [config, setConfig] = useState(initial);
    const { valid, fieldErrors } = checkDraft(config);
    const validConfig = valid ?? initial;
    return (
      <Section
        robot={{
          id: 'r1',
          teamId: 't1',
          teamName: 'Team',
          name: config.name,
          createdAt: '',
          headRevision: 1,
          updatedAt: '',
          lastFlash: null,
          photoUrl: null,
          role: 'editor',
        }}
        head={{ number: 1, message: 'First', authorName: null, createdAt: '', config: initial }}
        config={config}
        onChange={(next) => {
          current = next;
          changes(next);
          setConfig(next);
        }}
        problems={robotProblems(validConfig)}
        canEdit={options.canEdit ?? true}
        validConfig={validConfig}
        fieldErrors={fieldErrors}
        requestSave={requestSave}
      />
    );
  }
  const view = render(
    <MemoryRouter>
      <Host />
    </MemoryRouter>,
  );
  return { ...view, changes, requestSave, latest: () => current };
}
