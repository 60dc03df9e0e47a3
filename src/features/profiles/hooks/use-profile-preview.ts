/**
 * Parses the chosen file in the browser with the same reader the server uses,
 * so the planner sees what will be stored before sending it. The server parses
 * again and decides.
 */
import { useEffect, useState } from 'react';
import { decodeProfileBytes, parseProfileCsv, type ParseProfileResult, type ProfileKind } from '@shared/profile-csv';

export interface PreviewOptions {
  kind: ProfileKind;
  unit: string;
  intervalEnding: boolean;
  fillGaps: boolean;
}

export type PreviewState =
  | { status: 'idle' }
  | { status: 'working' }
  | { status: 'failed-to-read'; message: string }
  | { status: 'done'; firstLines: string[]; result: ParseProfileResult };

export function useProfilePreview(file: File | null, options: PreviewOptions, timezone: string): PreviewState {
  const [text, setText] = useState<{ file: File; text: string } | { file: File; error: string } | null>(null);
  const [state, setState] = useState<PreviewState>({ status: 'idle' });

  useEffect(() => {
    let cancelled = false;
    if (!file) return;
    file
      .arrayBuffer()
      .then((buffer) => !cancelled && setText({ file, text: decodeProfileBytes(new Uint8Array(buffer)) }))
      .catch((error: unknown) => !cancelled && setText({ file, error: error instanceof Error ? error.message : String(error) }));
    return () => {
      cancelled = true;
    };
  }, [file]);

  const { kind, unit, intervalEnding, fillGaps } = options;
  useEffect(() => {
    if (!file || !text || text.file !== file) {
      setState(file ? { status: 'working' } : { status: 'idle' });
      return;
    }
    if ('error' in text) {
      setState({ status: 'failed-to-read', message: text.error });
      return;
    }
    setState({ status: 'working' });
    // Yield first so "Reading the file…" paints before a large file blocks the thread for a moment.
    const timer = setTimeout(() => {
      const result = parseProfileCsv(text.text, { kind, unit, timezone, intervalEnding, fillGaps });
      const firstLines = text.text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/, 6);
      setState({ status: 'done', firstLines, result });
    }, 0);
    return () => clearTimeout(timer);
  }, [file, text, kind, unit, intervalEnding, fillGaps, timezone]);

  return state;
}
