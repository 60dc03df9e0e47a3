/** Messages between the upload form and its parsing worker. */
import type { ParseProfileOptions, ParseProfileResult } from '@shared/profile-csv';

export interface ParseRequest {
  /** Increases with every request, so an answer to an older choice is dropped. */
  id: number;
  file: File;
  options: ParseProfileOptions;
}

export type ParseResponse =
  | { id: number; status: 'done'; firstLines: string[]; result: ParseProfileResult }
  | { id: number; status: 'failed-to-read'; message: string };
