import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { errorMessage } from '../../lib/api';
import { Loading } from './Loading';
import { Notice } from './Notice';

/**
 * A query's states in one place: "Loading …" (`what`) while it waits, what failed as a caution notice, then
 * `children` with its data — or `empty` instead when that data is an empty list.
 */
export function Loaded<T>({
  query,
  what,
  empty,
  children,
}: {
  query: UseQueryResult<T>;
  what: string;
  empty?: ReactNode;
  children: (data: T) => ReactNode;
}) {
  if (query.isPending) return <Loading what={what} />;
  if (query.isError) return <Notice tone="caution" title={errorMessage(query.error)} live />;
  if (empty !== undefined && Array.isArray(query.data) && query.data.length === 0) return empty;
  return children(query.data);
}
