/** Bad input from the user (a flag, a value, a file): one clear line and exit code 2, never a stack trace. */
export class UsageError extends Error {
  override readonly name = 'UsageError';
}
