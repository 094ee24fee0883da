import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { FirmwareSection } from '@/features/firmware/components/firmware-section';
import {
  changed,
  firmwareFiles,
  renderInEditor,
  routeFetch,
  sectionProps,
  sketchCheck,
  verifyResult,
} from './factories';

const FILES = 'GET /robots/r1/revisions/3/files';
const PREVIEW = 'POST /robots/r1/preview-files';
const VERIFY = 'POST /robots/r1/revisions/3/verify';

const blocked = {
  status: 422,
  body: {
    error: {
      code: 'firmware_blocked',
      message: 'The firmware cannot be generated: Bridge A Enable (PWM) has no pin. (and 1 more)',
      fields: {
        'wiring.drivers.0.pins.a.en.pin': 'Bridge A Enable (PWM) has no pin.',
        'safety.failsafeTimeoutMs': 'Too long',
      },
      issues: [
        { path: ['wiring', 'drivers', 0, 'pins', 'a.en', 'pin'], message: 'Bridge A Enable (PWM) has no pin.' },
        { path: ['safety', 'failsafeTimeoutMs'], message: 'Too long' },
      ],
    },
  },
};

describe('the Firmware section', () => {
  it("lists the saved revision's files by folder and previews the sketch, highlighted", async () => {
    routeFetch({ [FILES]: { body: firmwareFiles({ revision: 3 }) } });
    renderInEditor(<FirmwareSection {...sectionProps()} />);
    const tree = await screen.findByRole('navigation', { name: 'Files in the bundle' });
    expect(within(tree).getByText('greenhouse_cart/')).toBeTruthy();
    expect(
      within(tree)
        .getAllByRole('button')
        .map((b) => b.textContent?.replace(/\d.*$/, '')),
    ).toEqual(['greenhouse_cart.ino', 'mw_config.h', 'README.md', 'config.json', 'manifest.json']);
    const code = screen.getByLabelText('Contents of greenhouse_cart/greenhouse_cart.ino');
    const voidWord = [...code.querySelectorAll('span')].find((span) => span.textContent === 'void');
    expect(voidWord?.className).toMatch(/^hljs-/);
    expect(code.querySelector('.hljs-meta')?.textContent).toContain('#include');
  });

  it('shows the file chosen in the tree', async () => {
    routeFetch({ [FILES]: { body: firmwareFiles({ revision: 3 }) } });
    renderInEditor(<FirmwareSection {...sectionProps()} />);
    await userEvent.setup().click(await screen.findByRole('button', { name: /^mw_config\.h/ }));
    expect(screen.getByRole('button', { name: /^mw_config\.h/ }).getAttribute('aria-current')).toBe('true');
    expect(screen.getByLabelText('Contents of greenhouse_cart/mw_config.h').textContent).toContain('MW_REVISION 3UL');
  });

  it("shows the remote's transmitter sketch as its own group for a home-made link", async () => {
    routeFetch({ [FILES]: { body: firmwareFiles({ revision: 3, remote: true }) } });
    renderInEditor(<FirmwareSection {...sectionProps()} />);
    const group = await screen.findByRole('region', { name: 'Remote transmitter sketch' });
    expect(within(group).getByText('greenhouse_cart_remote/')).toBeTruthy();
    expect(within(group).getAllByRole('button')).toHaveLength(2);
  });

  it('shows the boot line and offers the saved revision as a download', async () => {
    routeFetch({ [FILES]: { body: firmwareFiles({ revision: 3 }) } });
    renderInEditor(<FirmwareSection {...sectionProps()} />);
    expect(await screen.findByText(/^boot robot="Greenhouse Cart" revision=3 hash=1a2b3c4d/)).toBeTruthy();
    const link = screen.getByRole('link', { name: 'Download revision 3 (.zip)' });
    expect(link.getAttribute('href')).toBe('/api/robots/r1/revisions/3/bundle');
    expect(screen.getByText('Revision 3 as saved.')).toBeTruthy();
  });

  it("shows the unsaved draft's files, says so, and keeps the download on the saved revision", async () => {
    const props = sectionProps();
    const draft = changed(props.config, (c) => (c.safety.failsafeTimeoutMs = 150));
    const { calls } = routeFetch({
      [FILES]: { body: firmwareFiles({ revision: 3 }) },
      [PREVIEW]: { body: firmwareFiles({ revision: 4, draft: true }) },
    });
    renderInEditor(<FirmwareSection {...props} config={draft} />);
    expect(await screen.findByText(/revision=4 hash/, undefined, { timeout: 2000 })).toBeTruthy();
    expect(screen.getByText('Showing the firmware of your unsaved changes').parentElement?.textContent).toContain(
      '(it becomes revision 4 when saved)',
    );
    expect(screen.getByRole('link', { name: 'Download revision 3 (.zip)' })).toBeTruthy();
    const preview = calls.find((c) => c.method === 'POST');
    expect(
      (preview?.body as { config: { safety: { failsafeTimeoutMs: number } } }).config.safety.failsafeTimeoutMs,
    ).toBe(150);
  });

  it('lists what blocks generation, each linked to its field, and offers no download', async () => {
    routeFetch({ [FILES]: blocked });
    renderInEditor(<FirmwareSection {...sectionProps()} />);
    const list = await screen.findByRole('alert');
    expect(within(list).getByText('Revision 3 cannot become firmware')).toBeTruthy();
    const links = within(list).getAllByRole('link', { name: 'Show field' });
    expect(links.map((l) => l.getAttribute('href'))).toEqual([
      `/teams/t1/robots/r1/wiring?field=${encodeURIComponent('wiring.drivers.0.pins.a.en.pin')}`,
      `/teams/t1/robots/r1/safety?field=safety.failsafeTimeoutMs`,
    ]);
    expect(screen.queryByRole('link', { name: /Download/ })).toBeNull();
    expect(screen.getByRole('button', { name: 'Check that it compiles' }).hasAttribute('disabled')).toBe(true);
  });

  it('names the invalid fields of a draft the server refuses', async () => {
    const props = sectionProps();
    routeFetch({
      [FILES]: { body: firmwareFiles({ revision: 3 }) },
      [PREVIEW]: {
        status: 400,
        body: {
          error: {
            code: 'invalid_input',
            message: 'bad',
            fields: { 'config.chassis.wheels.0.radiusMm': 'Radius must be more than 0 mm' },
          },
        },
      },
    });
    renderInEditor(
      <FirmwareSection {...props} config={changed(props.config, (c) => (c.chassis.wheels[0].radiusMm = 0))} />,
    );
    const list = await screen.findByRole('alert', undefined, { timeout: 2000 });
    expect(within(list).getByText('Radius must be more than 0 mm')).toBeTruthy();
    expect(within(list).getByRole('link').getAttribute('href')).toBe(
      '/teams/t1/robots/r1/chassis?field=chassis.wheels.0.radiusMm',
    );
  });

  it('shows a failed request with a way to try again', async () => {
    routeFetch({
      [FILES]: {
        status: 500,
        body: { error: { code: 'server_error', message: 'Something went wrong on the server' } },
      },
    });
    renderInEditor(<FirmwareSection {...sectionProps()} />);
    expect((await screen.findByRole('alert')).textContent).toContain('Something went wrong on the server');
    expect(screen.getByRole('button', { name: 'Try again' })).toBeTruthy();
  });
});

describe("the Firmware section's compile check", () => {
  it('shows flash and RAM use against the board limits', async () => {
    routeFetch({ [FILES]: { body: firmwareFiles({ revision: 3 }) }, [VERIFY]: { body: verifyResult() } });
    renderInEditor(<FirmwareSection {...sectionProps()} />);
    await userEvent.setup().click(await screen.findByRole('button', { name: 'Check that it compiles' }));
    const flash = await screen.findByRole('meter', { name: 'Flash used' });
    expect(flash.getAttribute('aria-valuetext')).toBe('39 % (12,345 of 32,256 bytes)');
    expect(screen.getByRole('meter', { name: 'RAM used' }).getAttribute('aria-valuetext')).toBe(
      '35 % (700 of 2,048 bytes)',
    );
    expect(screen.getByText('Compiles')).toBeTruthy();
  });

  it("shows the compiler's messages when the code does not compile", async () => {
    const failed = sketchCheck({
      ok: false,
      flashBytes: undefined,
      messages: "greenhouse_cart/mw_config.h:3:1: error: expected ';'",
    });
    routeFetch({ [FILES]: { body: firmwareFiles({ revision: 3 }) }, [VERIFY]: { body: verifyResult([failed]) } });
    renderInEditor(<FirmwareSection {...sectionProps()} />);
    await userEvent.setup().click(await screen.findByRole('button', { name: 'Check that it compiles' }));
    expect(await screen.findByText('Does not compile')).toBeTruthy();
    expect(screen.getByText(/error: expected ';'/)).toBeTruthy();
  });

  it('says plainly when a board was not checked on this server', async () => {
    const esp = sketchCheck({
      board: 'esp32-devkitc',
      ok: null,
      messages: 'No compiler for this board on this server; only AVR boards are compiled here.',
    });
    routeFetch({ [FILES]: { body: firmwareFiles({ revision: 3 }) }, [VERIFY]: { body: verifyResult([esp]) } });
    renderInEditor(<FirmwareSection {...sectionProps()} />);
    await userEvent.setup().click(await screen.findByRole('button', { name: 'Check that it compiles' }));
    expect(await screen.findByText('Not checked here')).toBeTruthy();
    expect(screen.queryByRole('meter')).toBeNull();
  });

  it('shows a busy server as an error with a way to try again', async () => {
    routeFetch({
      [FILES]: { body: firmwareFiles({ revision: 3 }) },
      [VERIFY]: {
        status: 503,
        body: {
          error: {
            code: 'verify_busy',
            message: 'The compile check is busy with other bundles; try again in a minute',
          },
        },
      },
    });
    renderInEditor(<FirmwareSection {...sectionProps()} />);
    await userEvent.setup().click(await screen.findByRole('button', { name: 'Check that it compiles' }));
    expect((await screen.findByRole('alert')).textContent).toContain('busy with other bundles');
  });
});

describe("the Firmware section's settings", () => {
  it('changes the sketch name in the draft, and clears it back to the derived name', async () => {
    routeFetch({ [FILES]: { body: firmwareFiles({ revision: 3 }) } });
    const onChange = vi.fn();
    const { rerender } = renderInEditor(<FirmwareSection {...sectionProps({ onChange })} />);
    const user = userEvent.setup();
    const input = await screen.findByLabelText('Sketch name');
    await waitFor(() => expect(input.getAttribute('placeholder')).toBe('greenhouse_cart'));
    await user.type(input, 'c');
    const named = onChange.mock.lastCall?.[0];
    expect(named.firmware.sketchName).toBe('c');
    rerender(<FirmwareSection {...sectionProps({ onChange })} config={named} />);
    await user.clear(screen.getByLabelText('Sketch name'));
    expect(onChange.mock.lastCall?.[0].firmware.sketchName).toBeNull();
  });

  it('shows why a sketch name is refused', async () => {
    const props = sectionProps();
    routeFetch({
      [FILES]: { body: firmwareFiles({ revision: 3 }) },
      [PREVIEW]: { body: firmwareFiles({ revision: 4 }) },
    });
    renderInEditor(
      <FirmwareSection {...props} config={changed(props.config, (c) => (c.firmware.sketchName = 'my cart'))} />,
    );
    const input = await screen.findByLabelText('Sketch name');
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText(/Letters, digits, _ \. - only/)).toBeTruthy();
  });

  it('turns serial diagnostics off and disables their interval', async () => {
    routeFetch({ [FILES]: { body: firmwareFiles({ revision: 3 }) } });
    const onChange = vi.fn();
    const props = sectionProps({ onChange });
    const { rerender } = renderInEditor(<FirmwareSection {...props} />);
    await userEvent.setup().click(await screen.findByLabelText(/Print link health/));
    const next = onChange.mock.lastCall?.[0];
    expect(next.firmware.serialDiagnostics).toBe(false);
    rerender(<FirmwareSection {...props} config={next} />);
    await waitFor(() => expect(screen.getByLabelText('Health line every (ms)').hasAttribute('disabled')).toBe(true));
  });

  it('lets a viewer read the settings but change nothing', async () => {
    routeFetch({ [FILES]: { body: firmwareFiles({ revision: 3 }) } });
    renderInEditor(<FirmwareSection {...sectionProps({ canEdit: false })} />);
    const input = await screen.findByLabelText('Sketch name');
    expect(input.closest('fieldset')?.disabled).toBe(true);
    expect(screen.getByRole('link', { name: 'Download revision 3 (.zip)' })).toBeTruthy();
  });
});

describe('the Firmware section while a field is being corrected', () => {
  it('previews the last valid draft and lists the fields to correct, linked', async () => {
    const props = sectionProps();
    const valid = changed(props.config, (c) => (c.safety.failsafeTimeoutMs = 150));
    const typing = changed(valid, (c) => (c.chassis.wheels[0].radiusMm = Number.NaN));
    const { calls } = routeFetch({
      [FILES]: { body: firmwareFiles({ revision: 3 }) },
      [PREVIEW]: { body: firmwareFiles({ revision: 4, draft: true }) },
    });
    renderInEditor(
      <FirmwareSection
        {...props}
        config={typing}
        validConfig={valid}
        fieldErrors={{ 'chassis.wheels.0.radiusMm': 'Enter a number' }}
      />,
    );
    const list = await screen.findByRole('alert');
    expect(within(list).getByText('Enter a number')).toBeTruthy();
    expect(within(list).getByRole('link').getAttribute('href')).toBe(
      '/teams/t1/robots/r1/chassis?field=chassis.wheels.0.radiusMm',
    );
    await waitFor(() => expect(calls.some((c) => c.method === 'POST')).toBe(true), { timeout: 2000 });
    expect((calls.find((c) => c.method === 'POST')?.body as { config: unknown }).config).toEqual(valid);
  });
});
