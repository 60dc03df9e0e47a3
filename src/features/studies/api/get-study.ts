import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Study } from '@shared/schemas/study';
import { api } from '@/lib/api-client';
import { isJobActive } from '@/components/job-progress';

export const getStudy = (id: string) => api.get<Study>(`/api/studies/${id}`);

/** Polls once a second while the study's job runs. */
export const getStudyQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['studies', 'detail', id],
    queryFn: () => getStudy(id),
    refetchInterval: (query) => (isJobActive(query.state.data?.job) ? 1000 : false),
  });

export const useStudy = (id: string) => useQuery(getStudyQueryOptions(id));
