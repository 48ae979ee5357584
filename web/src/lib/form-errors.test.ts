import { describe, expect, it, vi } from 'vitest';
import { ApiError } from './api-client';
import { applyServerErrors, fieldForPath } from './form-errors';

describe('fieldForPath', () => {
  it('maps a detail path onto the closest form field', () => {
    expect(fieldForPath('email', ['email', 'roles'])).toBe('email');
    expect(fieldForPath('roles.0', ['email', 'roles'])).toBe('roles');
    expect(fieldForPath('line 3', ['email', 'roles'])).toBeUndefined();
  });
});

describe('applyServerErrors', () => {
  it('puts field details on their fields and leaves nothing for the banner', () => {
    const setError = vi.fn();
    const error = new ApiError(400, 'validation_failed', 'Check the form.', [{ path: 'roles.1', message: 'Unknown role.' }]);
    expect(applyServerErrors(error, setError, ['email', 'roles'])).toEqual({ bannerMessage: null, unplaced: [] });
    expect(setError).toHaveBeenCalledWith('roles', { type: 'server', message: 'Unknown role.' }, { shouldFocus: true });
  });

  it('returns details it cannot place, with the summary for a banner', () => {
    const setError = vi.fn();
    const error = new ApiError(400, 'validation_failed', 'Check the form.', [{ path: 'other', message: 'Nope.' }]);
    expect(applyServerErrors(error, setError, ['email'])).toEqual({
      bannerMessage: 'Check the form.',
      unplaced: [{ path: 'other', message: 'Nope.' }],
    });
    expect(setError).not.toHaveBeenCalled();
  });

  it('puts a detail-less 409 on the fallback field, but keeps a 429 for the banner', () => {
    const setError = vi.fn();
    applyServerErrors(new ApiError(409, 'already_member', 'Already a member.'), setError, ['email'], 'email');
    expect(setError).toHaveBeenCalledWith('email', { type: 'server', message: 'Already a member.' }, { shouldFocus: true });
    const result = applyServerErrors(new ApiError(429, 'rate_limited', 'Too many requests.'), vi.fn(), ['email'], 'email');
    expect(result.bannerMessage).toBe('Too many requests.');
  });
});
