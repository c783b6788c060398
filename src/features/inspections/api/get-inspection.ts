import { inspectionSchema } from '@shared/inspections/schema';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { inspectionKeys } from '../../../lib/query-keys';
import { inspectionPaths } from './paths';

/** `GET /api/inspections/:inspectionId` → the inspection with its items, deficiencies and signatures. */
export const inspectionQueryOptions = (inspectionId: string) =>
  queryOptions({
    queryKey: inspectionKeys.detail(inspectionId),
    queryFn: ({ signal }) => apiRequest(inspectionPaths.one(inspectionId), inspectionSchema, { signal }),
    // Several people work on one inspection at once: a page shows the kept copy and asks again at once.
    staleTime: 0,
  });

export const useInspection = (inspectionId: string) => useQuery(inspectionQueryOptions(inspectionId));
