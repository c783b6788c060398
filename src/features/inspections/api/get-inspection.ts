import { inspectionSchema } from '@shared/inspections/schema';
import { useQuery } from '@tanstack/react-query';
import { getQuery } from '../../../lib/api-cache';
import { inspectionKeys } from '../../../lib/query-keys';
import { inspectionPaths } from './paths';

/** `GET /api/inspections/:inspectionId` → the inspection with its items, deficiencies and signatures. */
export const inspectionQueryOptions = (inspectionId: string) =>
  getQuery(inspectionKeys.detail(inspectionId), inspectionPaths.one(inspectionId), inspectionSchema, {
    // Several people work on one inspection at once: a page shows the kept copy and asks again at once.
    staleTime: 0,
  });

export const useInspection = (inspectionId: string) => useQuery(inspectionQueryOptions(inspectionId));
