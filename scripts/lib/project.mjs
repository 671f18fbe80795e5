import { createHash } from 'node:crypto';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The repository's root folder (scripts/ is directly under it). */
export const rootDir = join(dirname(fileURLToPath(import.meta.url)), '..', '..');

/** Where the start command's cluster lives: in the project, or (if the server's user cannot reach the project) under /var/tmp. */
export function clusterFolders() {
  const id = createHash('sha1').update(rootDir).digest('hex').slice(0, 10);
  return [join(rootDir, '.data', 'postgres'), join('/var/tmp', `mixmark-${id}`, 'postgres')];
}
