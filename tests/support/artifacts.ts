import { mkdirSync } from 'node:fs';
import path from 'node:path';

/** Screenshots from the journeys land in tests/.artifacts (ignored by git) for people to look at. */
export function artifactPath(name: string): string {
  const dir = path.resolve('tests/.artifacts');
  mkdirSync(dir, { recursive: true });
  return path.join(dir, name);
}
