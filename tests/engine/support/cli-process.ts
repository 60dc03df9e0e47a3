/** Temporary input files and child-process runs for the command-line tests. */
import { execFile } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export const repoRoot = join(import.meta.dirname, '..', '..', '..');

export interface Run {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
}

/** A temporary folder and a writer of named files in it. */
export function tempFiles(prefix: string) {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  const file = (name: string, text: string) => {
    writeFileSync(join(dir, name), text);
    return join(dir, name);
  };
  return { dir, file };
}

/** Runs a command in the repository root; never rejects: the exit code is in the result. */
export function runProcess(command: string, args: readonly string[], env: NodeJS.ProcessEnv = process.env): Promise<Run> {
  return new Promise((resolve) => {
    execFile(command, args, { cwd: repoRoot, env, maxBuffer: 64 << 20 }, (error, stdout, stderr) => {
      resolve({ code: error ? Number(error.code ?? 1) : 0, stdout, stderr });
    });
  });
}
