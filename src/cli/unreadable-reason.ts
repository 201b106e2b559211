/**
 * Why a file could not be read, in plain words, from the error `readFileSync` threw.
 *
 * @example unreadableReason(Object.assign(new Error(), { code: 'ENOENT' })) // 'does not exist'
 */
export function unreadableReason(e: unknown): string {
  const code = (e as NodeJS.ErrnoException)?.code;
  switch (code) {
    case 'ENOENT':
    case 'ENOTDIR':
      return 'does not exist';
    case 'EISDIR':
      return 'is a folder, not a file';
    case 'EACCES':
    case 'EPERM':
      return 'cannot be read: permission denied';
    default:
      return `cannot be read (${code ?? String(e)})`;
  }
}
