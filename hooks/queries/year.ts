import { keepPreviousData, useQuery } from '@tanstack/react-query';

import { yearSchema } from '@/shared/schemas/year';

import { apiRequest } from '../api-client';
import { staleTimes } from '../query-config';

export const yearKeys = {
  all: ['year'] as const,
  detail: (year: number) => [...yearKeys.all, year] as const,
};

/** The maker's year: sales, venues, series, exposure, the VAT threshold (owner only). */
export function useYearQuery(year: number) {
  return useQuery({
    queryKey: yearKeys.detail(year),
    queryFn: ({ signal }) => apiRequest(`/api/year?year=${year}`, { schema: yearSchema, signal }),
    staleTime: staleTimes.year,
    placeholderData: keepPreviousData,
  });
}

/** The accountant's files for a year. */
export const yearCsvPaths = (year: number) =>
  ({
    sales: `/api/year/sales.csv?year=${year}`,
    payments: `/api/year/payments.csv?year=${year}`,
    statements: `/api/year/statements.csv?year=${year}`,
  }) as const;
