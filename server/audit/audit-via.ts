/**
 * How the current request's actor reached us when not through a browser session
 * (an API token). The token middleware enters it for the rest of the request, so
 * every audit row the request writes says "via token <name>" without each service
 * passing it along. Node's AsyncLocalStorage carries it through awaits, the JSON
 * body parser and multer; background jobs run outside any request and carry none.
 */
import { AsyncLocalStorage } from 'node:async_hooks';

export interface AuditVia {
  /** Shown in the trail, e.g. `token nightly push`. Never the secret. */
  label: string;
  tokenId: string;
}

const storage = new AsyncLocalStorage<AuditVia>();

export function runWithAuditVia<T>(via: AuditVia, work: () => T): T {
  return storage.run(via, work);
}

export function currentAuditVia(): AuditVia | undefined {
  return storage.getStore();
}
