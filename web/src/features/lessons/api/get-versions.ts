import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { VersionDtoSchema, VersionSummaryDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { lessonKeys, lessonUrl } from './keys';

const VersionListDtoSchema = z.object({ versions: z.array(VersionSummaryDtoSchema) });

/** Every published version, newest first, each with what changed from the one before. */
export const getVersions = (lessonId: string) => api.get(lessonUrl(lessonId, '/versions'), VersionListDtoSchema);

export const versionsQueryOptions = (lessonId: string) =>
  queryOptions({ queryKey: lessonKeys.versions(lessonId), queryFn: () => getVersions(lessonId) });

export const useVersions = (lessonId: string) => useQuery(versionsQueryOptions(lessonId));

/** One version with its frozen content. */
export const getVersion = (lessonId: string, number: number) => api.get(lessonUrl(lessonId, `/versions/${number}`), VersionDtoSchema);

export const versionQueryOptions = (lessonId: string, number: number) =>
  queryOptions({ queryKey: lessonKeys.version(lessonId, number), queryFn: () => getVersion(lessonId, number) });

export const useVersion = (lessonId: string, number: number | null) =>
  useQuery({ ...versionQueryOptions(lessonId, number ?? 0), enabled: number !== null });
