import { useMutation } from '@tanstack/react-query';
import { NoticeDtoSchema, type JoinClassRequest } from '@core/contracts';
import { api } from '@/lib/api-client';

/** A signed-out student asks to join a class; the answer is neutral whatever happened (a link is e-mailed if allowed). */
export const joinByCode = (body: JoinClassRequest) => api.post('/api/auth/join', body, NoticeDtoSchema);

export const useJoinByCode = () => useMutation({ mutationFn: joinByCode });
