/**
 * Parses the chosen file in the browser with the same reader the server uses,
 * so the planner sees what will be stored before sending it. The server parses
 * again and decides. The parsing runs in a worker, so the form stays live.
 */
import { useEffect, useRef, useState } from 'react';
import type { DateOrder, DecimalSeparator, ParseProfileResult, ProfileKind } from '@shared/profile-csv';
import type { ParseRequest, ParseResponse } from '../workers/parse-profile-messages';

export interface PreviewOptions {
  kind: ProfileKind;
  unit: string;
  intervalEnding: boolean;
  fillGaps: boolean;
  dateOrder: DateOrder | undefined;
  decimalSeparator: DecimalSeparator | undefined;
}

export type PreviewState =
  | { status: 'idle' }
  | { status: 'working' }
  | { status: 'failed-to-read'; message: string }
  | { status: 'done'; firstLines: string[]; result: ParseProfileResult };

export function useProfilePreview(file: File | null, options: PreviewOptions, timezone: string): PreviewState {
  const [state, setState] = useState<PreviewState>({ status: 'idle' });
  const worker = useRef<Worker | null>(null);
  const lastId = useRef(0);

  useEffect(() => {
    const w = new Worker(new URL('../workers/parse-profile.worker.ts', import.meta.url), { type: 'module' });
    w.addEventListener('message', (event: MessageEvent<ParseResponse>) => {
      const { id, ...rest } = event.data;
      if (id === lastId.current) setState(rest);
    });
    w.addEventListener('error', (event) =>
      setState({ status: 'failed-to-read', message: `The preview could not run: ${event.message}` }),
    );
    worker.current = w;
    return () => {
      w.terminate();
      worker.current = null;
    };
  }, []);

  const { kind, unit, intervalEnding, fillGaps, dateOrder, decimalSeparator } = options;
  useEffect(() => {
    const id = ++lastId.current;
    if (!file || !worker.current) {
      setState({ status: 'idle' });
      return;
    }
    setState({ status: 'working' });
    const request: ParseRequest = {
      id,
      file,
      options: {
        kind,
        unit,
        timezone,
        intervalEnding,
        fillGaps,
        ...(dateOrder ? { dateOrder } : {}),
        ...(decimalSeparator ? { decimalSeparator } : {}),
      },
    };
    worker.current.postMessage(request);
  }, [file, kind, unit, intervalEnding, fillGaps, dateOrder, decimalSeparator, timezone]);

  return state;
}
