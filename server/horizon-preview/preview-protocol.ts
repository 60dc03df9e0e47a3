/** Messages between the web process and the preview thread (structured-clone data only). */
import type { PlanInputs } from '@shared/schemas/plan';
import type { ErrorIssue } from '../http/app-error';
import type { SnapshotSeries } from '../runs/profile-series';
import type { PreviewFigures } from './preview-solve';

export interface PreviewRequest {
  readonly id: number;
  /** Names the snapshot: plan id and input version. */
  readonly key: string;
  readonly inputs: PlanInputs;
  readonly horizonHours: number;
  /** Sent only after the thread answered `miss` for this key. */
  readonly series?: SnapshotSeries;
}

/** An AppError's fields, to be thrown again on the web side with the same answer. */
export interface RefusalFields {
  readonly code: string;
  readonly message: string;
  readonly status: number;
  readonly issues?: readonly ErrorIssue[];
  readonly extra?: Record<string, unknown>;
}

export type PreviewReply =
  | { readonly id: number; readonly type: 'miss' }
  | { readonly id: number; readonly type: 'done'; readonly preview: PreviewFigures }
  | { readonly id: number; readonly type: 'refused'; readonly refusal: RefusalFields }
  | { readonly id: number; readonly type: 'failed'; readonly message: string };
