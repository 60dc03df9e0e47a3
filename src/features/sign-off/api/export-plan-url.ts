/** The CSV export is a plain download (the browser saves it under the server's file name), not a fetch. */
export const exportPlanUrl = (planId: string) => `/api/plans/${encodeURIComponent(planId)}/export.csv`;
