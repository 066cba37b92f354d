import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AcceptInviteInput, SignInInput, UpdateProfileInput } from '@shared/schemas/auth.schema';
import { api, resetCsrfToken } from '@client/lib/api-client';
import { authKeys, type MeUser } from './me';

/** After anything that changes who is signed in: new CSRF token, fresh /me, nothing cached from the old person. */
function useSessionChanged() {
  const qc = useQueryClient();
  return async () => {
    resetCsrfToken();
    qc.removeQueries({ predicate: (q) => q.queryKey[0] !== 'auth' });
    await qc.invalidateQueries({ queryKey: authKeys.me });
  };
}

export function useSignIn() {
  const changed = useSessionChanged();
  return useMutation({
    mutationFn: (input: SignInInput) => api.post<{ user: MeUser }>('/session', input),
    onSuccess: changed,
  });
}

export function useSignOut() {
  const changed = useSessionChanged();
  return useMutation({ mutationFn: () => api.delete('/session'), onSuccess: changed });
}

export function useAcceptInvite() {
  const changed = useSessionChanged();
  return useMutation({
    mutationFn: (input: AcceptInviteInput) =>
      api.post<{ user: MeUser; clubId: string }>('/invites/accept', input),
    onSuccess: changed,
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (email: string) => api.post<{ message: string }>('/password-resets', { email }),
  });
}

export function useResetPassword() {
  const changed = useSessionChanged();
  return useMutation({
    mutationFn: (input: { token: string; password: string }) =>
      api.post<{ user: MeUser }>('/password-resets/confirm', input),
    onSuccess: changed,
  });
}

export function useUpdateProfile() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateProfileInput) => api.patch<{ user: MeUser }>('/me', input),
    onSuccess: () => qc.invalidateQueries({ queryKey: authKeys.me }),
  });
}
