/** Messages between a job and its worker thread (structured-clone data only). */
export interface ThreadRequest {
  readonly task: 'plan' | 'study';
  readonly input: unknown;
}

export type ThreadMessage =
  | { readonly type: 'progress'; readonly shareDone: number; readonly message: string | null }
  | { readonly type: 'done'; readonly output: unknown }
  | { readonly type: 'failed'; readonly message: string };
