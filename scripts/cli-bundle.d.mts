// Types of cli-bundle.mjs (plain JavaScript so it runs without tsx), for tests and scripts.
/** Path of the bundle relative to the repository root. */
export const CLI_BUNDLE: string;
/** True when the bundle exists and every file it was built from is unchanged. */
export function cliBundleIsFresh(root: string): boolean;
/** Builds the bundle and its manifest; returns the bundle's absolute path. */
export function buildCliBundle(root: string): Promise<string>;
/** The bundle's absolute path, built first when missing or stale; null when it cannot be built. */
export function ensureCliBundle(root: string, log?: (message: string) => void): Promise<string | null>;
