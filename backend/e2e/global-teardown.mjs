// Removes the cluster that global-setup started for a stand-alone run (none under `npm test`).
export default async function globalTeardown() {
  await globalThis.__mixmarkTestSmtp?.close();
  await globalThis.__mixmarkTestCluster?.remove();
}
