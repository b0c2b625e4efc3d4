import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { SignInBody, User } from '@/shared/api/auth';
import { api, isApiRequestError } from '@/lib/api/client';

export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
};

/** Who is signed in changes only through this app's own mutations, so the answer stays fresh a while. */
export const ME_STALE_MS = 5 * 60_000;

/** The signed-in user, or null when signed out (a 401 is an answer here, not an error). */
export async function fetchMe(): Promise<User | null> {
  try {
    const { user } = await api.get<{ user: User }>('/api/auth/me');
    return user;
  } catch (error) {
    if (isApiRequestError(error) && error.status === 401) return null;
    throw error;
  }
}

export function useMe() {
  return useQuery({ queryKey: authKeys.me(), queryFn: fetchMe, staleTime: ME_STALE_MS });
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SignInBody) => api.post<{ user: User }>('/api/auth/sign-in', body),
    onSuccess: ({ user }) => {
      // Whatever another account had cached must not leak into this one.
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<void>('/api/auth/sign-out'),
    onSuccess: () => {
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
      queryClient.setQueryData(authKeys.me(), null);
    },
  });
}
