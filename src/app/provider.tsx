import { Fragment, type ReactNode } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { useDecimalSeparator } from '@/lib/number-format';
import { queryClient } from '@/lib/query-client';

export function AppProvider({ children }: { children: ReactNode }) {
  // A new number format redraws every page: numbers shown and form texts follow it (the data stay cached).
  const decimal = useDecimalSeparator();
  return (
    <QueryClientProvider client={queryClient}>
      <Fragment key={decimal}>{children}</Fragment>
    </QueryClientProvider>
  );
}
