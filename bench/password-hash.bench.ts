// How long one password hash takes at the default scrypt cost (sign-up, sign-in and reset each pay it once).
import { DEFAULT_PASSWORD_COST, hashPassword, verifyPassword } from '../server/lib/password';

export async function run(): Promise<void> {
  const rounds = 5;
  const started = performance.now();
  let stored = '';
  for (let i = 0; i < rounds; i += 1) stored = await hashPassword(`correct horse ${i}`);
  const hashMs = (performance.now() - started) / rounds;
  const verifyStarted = performance.now();
  await verifyPassword(stored, 'wrong guess');
  const verifyMs = performance.now() - verifyStarted;
  const { log2N, r, p } = DEFAULT_PASSWORD_COST;
  const memoryMiB = (128 * 2 ** log2N * r) / 2 ** 20;
  console.log(
    `scrypt N=2^${log2N} r=${r} p=${p} (${memoryMiB} MiB): hash ${hashMs.toFixed(0)} ms, verify ${verifyMs.toFixed(0)} ms`,
  );
}
