import { useMutation } from '@tanstack/react-query';
import { NoticeDtoSchema, type EmailLinkRequest } from '@core/contracts';
import { api } from '@/lib/api-client';

export const requestEmailLink = (body: EmailLinkRequest) => api.post('/api/auth/email-link', body, NoticeDtoSchema);

export const useRequestEmailLink = () => useMutation({ mutationFn: requestEmailLink });
