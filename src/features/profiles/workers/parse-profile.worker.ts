/**
 * Reads and parses a chosen profile file off the page's thread: a year of
 * 5-minute rows takes a second or two in a browser, long enough to freeze the
 * form if done on the main thread.
 */
import { decodeProfileBytes, parseProfileCsv, type ParseProfileOptions } from '@shared/profile-csv';
import type { ParseRequest, ParseResponse } from './parse-profile-messages';

const answer = (response: ParseResponse) => self.postMessage(response);

// The last file's text, so changing the kind or unit does not read and decode it again.
let cached: { file: File; text: Promise<string> } | null = null;
const textOf = (file: File) => {
  if (cached?.file !== file)
    cached = { file, text: file.arrayBuffer().then((buffer) => decodeProfileBytes(new Uint8Array(buffer))) };
  return cached.text;
};

self.addEventListener('message', (event: MessageEvent<ParseRequest>) => {
  const { id, file, options } = event.data;
  textOf(file)
    .then((text) => {
      const result = parseProfileCsv(text, options satisfies ParseProfileOptions);
      const firstLines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/, 6);
      answer({ id, status: 'done', firstLines, result });
    })
    .catch((error: unknown) =>
      answer({ id, status: 'failed-to-read', message: error instanceof Error ? error.message : String(error) }),
    );
});
