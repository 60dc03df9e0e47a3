/**
 * An audit event's details as a line a person reads: ids replaced by the names the server
 * looked up (the id's start when the thing is gone), instants written like every other time
 * in the app, other values as they are.
 */
import { formatMoment } from '@/lib/format';

const INSTANT = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:\d{2})$/;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function valueText(key: string, value: unknown, names: Record<string, string>): string {
  if (typeof value === 'string') {
    if (/Id$/.test(key) && names[value]) return names[value];
    if (UUID.test(value)) return `${value.slice(0, 8)}…`;
    if (INSTANT.test(value)) return formatMoment(value);
    return value;
  }
  return JSON.stringify(value);
}

/** "siteId" → "site", "batteryIds" stays: the key as a word, without the id suffix once the value is a name. */
const keyText = (key: string, named: boolean) => (named ? key.replace(/Id$/, '') : key);

export function describeDetails(details: Record<string, unknown>, names: Record<string, string>): string {
  return Object.entries(details)
    .map(([key, value]) => {
      const named = typeof value === 'string' && /Id$/.test(key) && names[value] !== undefined;
      return `${keyText(key, named)}: ${valueText(key, value, names)}`;
    })
    .join(' · ');
}
