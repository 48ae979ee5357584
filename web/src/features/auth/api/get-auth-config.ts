import { queryOptions, useQuery } from '@tanstack/react-query';
import { AuthConfigDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

export const getAuthConfig = () => api.get('/api/auth/config', AuthConfigDtoSchema);

export const authConfigQueryOptions = () => queryOptions({ queryKey: authKeys.config(), queryFn: getAuthConfig, staleTime: Infinity });

export const useAuthConfig = () => useQuery(authConfigQueryOptions());
