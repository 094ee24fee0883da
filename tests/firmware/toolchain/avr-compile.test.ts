import { describe, expect, it } from 'vitest';
import { compileAvrSketch, parseSizeOutput } from '@server/features/firmware/toolchain/avr-compile';

const fixture = (name: string) => new URL(`../fixtures/${name}`, import.meta.url).pathname;

describe('compiling a sketch folder against the Arduino AVR core', () => {
  it('reports flash and RAM use of a clean sketch for the Uno and the Mega', async () => {
    const [uno, mega] = await Promise.all([
      compileAvrSketch(fixture('sim_probe'), 'uno'),
      compileAvrSketch(fixture('sim_probe'), 'mega2560'),
    ]);
    expect(uno).toMatchObject({ ok: true, flashMax: 32256, ramMax: 2048 });
    expect(mega).toMatchObject({ ok: true, flashMax: 253952, ramMax: 8192 });
    if (!uno.ok || !mega.ok) return;
    // Serial alone costs more than a kilobyte of flash and its buffers about 150 bytes of RAM.
    expect(uno.flashBytes).toBeGreaterThan(1000);
    expect(uno.ramBytes).toBeGreaterThan(150);
    expect(mega.flashBytes).toBeGreaterThan(uno.flashBytes);
  });

  it('treats a warning in the sketch as an error and returns the message with the sketch path', async () => {
    const result = await compileAvrSketch(fixture('warns_once'), 'uno');
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.stage).toBe('compile');
    expect(result.messages).toContain('warns_once/warns_once.ino:2');
    expect(result.messages).toContain('unused variable');
    expect(result.messages).not.toContain('/work/');
  });

  it('stops a step that runs past its time limit', async () => {
    const result = await compileAvrSketch(fixture('sim_probe'), 'uno', { timeoutMs: 1 });
    expect(result).toMatchObject({ ok: false, stage: 'timeout' });
  });
});

describe('reading avr-size output', () => {
  it('takes flash as text plus data and RAM as data plus bss', () => {
    const text =
      'firmware.elf  :\nsection   size      addr\n.data        22   8388864\n.text      2330         0\n.bss        168   8388886\n';
    expect(parseSizeOutput(text)).toEqual({ text: 2330, data: 22, bss: 168 });
  });
});
