/** STUDY_THREADS: threads one horizon study may use for its independent runs (1 leaves the other cores to the API). */
import { z } from 'zod';

const studyThreadsSchema = z.coerce.number().int().min(1).max(16).default(1);

export function studyThreads(env: NodeJS.ProcessEnv = process.env): number {
  const parsed = studyThreadsSchema.safeParse(env.STUDY_THREADS);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  STUDY_THREADS: ${i.message}`);
    throw new Error(`Invalid job settings in the environment:\n${lines.join('\n')}`);
  }
  return parsed.data;
}
