/** Release functions of the work locks this tab holds, by work id. */
const held = new Map<string, () => void>();

/**
 * Takes the Web Lock named for a piece of work and holds it until released, so two tabs never
 * save the same work over each other. False when another tab holds it. Without Web Locks (a
 * page not served securely) every claim succeeds: one tab is assumed.
 */
export function claimWork(id: string): Promise<boolean> {
  if (held.has(id)) return Promise.resolve(true);
  const locks = typeof navigator === 'undefined' ? undefined : navigator.locks;
  if (locks === undefined) return Promise.resolve(true);
  return new Promise((resolve) => {
    void locks.request(`conecast-work:${id}`, { ifAvailable: true }, (lock) => {
      if (lock === null) {
        resolve(false);
        return undefined;
      }
      resolve(true);
      return new Promise<void>((release) => held.set(id, release));
    });
  });
}

/** Lets another tab take the work. */
export function releaseWork(id: string): void {
  held.get(id)?.();
  held.delete(id);
}
