import { firmMemberSchema } from '@shared/schemas/firm-members';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { getQuery } from '../../../lib/api-cache';
import { firmMemberKeys } from '../../../lib/query-keys';
import { firmMembersPath } from './paths';

const responseSchema = z.object({ members: z.array(firmMemberSchema) });

/** `GET /api/organisations/:orgId/members` → the firm's people with their firm roles. */
export const firmMembersQueryOptions = (orgId: string) =>
  getQuery(firmMemberKeys.list(orgId), firmMembersPath(orgId), responseSchema, { pick: (r) => r.members });

export const useFirmMembers = (orgId: string | undefined) =>
  useQuery({ ...firmMembersQueryOptions(orgId ?? ''), enabled: orgId !== undefined });
