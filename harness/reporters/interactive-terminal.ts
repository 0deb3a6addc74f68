/**
 * Whether terminal output may use colour and an in-place progress bar: only on a TTY, and not in
 * CI, which CI services announce with the variable CI (set to "true" by most, "1" by some); an
 * empty value or "false" / "0" means not in CI.
 */
export function isInteractiveTerminal(stream: { readonly isTTY?: boolean }, env: Readonly<Record<string, string | undefined>>): boolean {
  const ci = (env.CI ?? '').trim().toLowerCase();
  const inCi = ci !== '' && ci !== 'false' && ci !== '0';
  return stream.isTTY === true && !inCi;
}
