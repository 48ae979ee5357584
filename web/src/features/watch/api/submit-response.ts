import { ResponseResultDtoSchema, type ResponseResultDto, type ResponseSubmit } from '@core/contracts';
import { serverClock } from '../server-clock';
import { assignmentApi } from './paths';
import { readBody } from '@/lib/api-client';
import { postWithToken } from './post-with-token';

/** Sends one answer; the reply comes only after its row is committed. A resend with the same key returns the stored result. */
export async function submitResponse(assignmentId: string, body: ResponseSubmit, token: string | null): Promise<ResponseResultDto> {
  const response = await postWithToken(assignmentApi(assignmentId, '/responses'), body, token);
  const result = await readBody(response, ResponseResultDtoSchema);
  serverClock.observe(result.serverTime);
  return result;
}
