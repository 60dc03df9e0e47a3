/**
 * Instants in a site's own local time, for lists that mix sites: planners think
 * in the site's clock (a delivery day starts at local midnight), and sites may
 * lie in different zones. Uses the cached site list.
 */
import { formatLocalTime } from '@/lib/format';
import { useRunSourceLists } from './run-source-fields';

export function useSiteTime() {
  const { sites } = useRunSourceLists('');
  const zoneOf = (siteId: string | null) => sites.data?.find((s) => s.id === siteId)?.timezone ?? 'UTC';
  return {
    zoneOf,
    /** "2026-12-01 00:00 +01:00" in the site's zone (UTC until the site list has loaded). */
    local: (iso: string, siteId: string | null) => formatLocalTime(Date.parse(iso), zoneOf(siteId)),
  };
}
