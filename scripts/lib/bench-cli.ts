/**
 * Times an engine command the way people run it, `npm run --silent cli -- …`,
 * as a whole: npm, process start, module loading, input parsing, the engine and
 * the JSON output. Wall time and the CPU time of the whole process tree (npm,
 * the shell and node) are both reported, best of several runs, because the
 * 2-core machine is often shared and waiting for a core inflates only the wall
 * figure. The same command on the TypeScript sources through tsx (the way it
 * ran before the prebuilt bundle) is the baseline.
 */
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';

/** User + system seconds of the waited-for children of this process (Linux /proc), or null elsewhere. */
function childCpuSeconds(): number | null {
  try {
    const stat = readFileSync('/proc/self/stat', 'utf8');
    // Fields after the command name in parentheses; cutime and cstime are fields 16 and 17 of the line.
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    const ticks = Number(fields[13]) + Number(fields[14]);
    const perSecond = Number(spawnSync('getconf', ['CLK_TCK'], { encoding: 'utf8' }).stdout.trim()) || 100;
    return Number.isFinite(ticks) ? ticks / perSecond : null;
  } catch {
    return null;
  }
}

interface Run {
  readonly seconds: number;
  readonly cpuSeconds: number | null;
  readonly exitCode: number | null;
  readonly engineSeconds: number | null;
}

function runOnce(args: readonly string[], env: NodeJS.ProcessEnv): Run {
  const cpuBefore = childCpuSeconds();
  const started = performance.now();
  const result = spawnSync('npm', ['run', '--silent', 'cli', '--', ...args], { encoding: 'utf8', env, maxBuffer: 64 << 20 });
  const seconds = (performance.now() - started) / 1000;
  const cpuAfter = childCpuSeconds();
  let engineSeconds: number | null = null;
  try {
    const out = JSON.parse(result.stdout) as { seconds?: unknown };
    engineSeconds = typeof out.seconds === 'number' ? out.seconds : null;
  } catch {
    // Reported through exitCode.
  }
  return {
    seconds,
    cpuSeconds: cpuBefore === null || cpuAfter === null ? null : cpuAfter - cpuBefore,
    exitCode: result.status,
    engineSeconds,
  };
}

const round = (v: number | null) => (v === null ? null : Number(v.toFixed(3)));
const minOf = (xs: readonly (number | null)[]) => (xs.some((x) => x === null) ? null : Math.min(...(xs as number[])));

function best(runs: readonly Run[]) {
  return {
    seconds: round(minOf(runs.map((r) => r.seconds))),
    cpuSeconds: round(minOf(runs.map((r) => r.cpuSeconds))),
    engineSeconds: round(minOf(runs.map((r) => r.engineSeconds))),
    exitCodes: [...new Set(runs.map((r) => r.exitCode))],
  };
}

/**
 * Best of `runs` runs of the command on the prebuilt bundle against best of
 * `baselineRuns` on the sources through tsx, alternating so both see the same load.
 */
export function benchCliCommand(args: readonly string[], targetSeconds: number, runs = 3, baselineRuns = 2) {
  // Prints the usage; the launcher (re)builds the bundle first when a source changed: untimed.
  runOnce(['--help'], process.env);
  const bundle: Run[] = [];
  const sources: Run[] = [];
  for (let i = 0; i < Math.max(runs, baselineRuns); i++) {
    if (i < runs) bundle.push(runOnce(args, process.env));
    if (i < baselineRuns) sources.push(runOnce(args, { ...process.env, SLACKWATER_CLI_SOURCES: '1' }));
  }
  const b = best(bundle);
  const s = best(sources);
  return {
    command: `npm run --silent cli -- ${args.join(' ')}`,
    runs,
    ...b,
    targetSeconds,
    meetsTarget: b.seconds !== null && b.seconds <= targetSeconds,
    tsxSources: { runs: baselineRuns, ...s },
    speedupVsTsxSources: {
      wall: s.seconds && b.seconds ? Number((s.seconds / b.seconds).toFixed(2)) : null,
      cpu: s.cpuSeconds && b.cpuSeconds ? Number((s.cpuSeconds / b.cpuSeconds).toFixed(2)) : null,
    },
  };
}
