/** A small logger that neutralises line breaks in logged text (ASVS 5.0 16.4). */
const levels = { silent: 0, error: 1, info: 2, debug: 3 } as const;
type Level = keyof typeof levels;

let current: Level = (process.env.LOG_LEVEL as Level | undefined) ?? (process.env.NODE_ENV === 'test' ? 'error' : 'info');

const clean = (text: string) => text.replace(/[\r\n]+/g, ' ⏎ ');

function write(level: Exclude<Level, 'silent'>, message: string, error?: unknown) {
  if (levels[current] < levels[level]) return;
  const line = `${new Date().toISOString()} ${level.toUpperCase()} ${clean(message)}`;
  if (level === 'error') console.error(line, error instanceof Error ? error.stack : (error ?? ''));
  else console.log(line);
}

export const logger = {
  setLevel: (level: Level) => (current = level),
  error: (message: string, error?: unknown) => write('error', message, error),
  info: (message: string) => write('info', message),
  debug: (message: string) => write('debug', message),
};
