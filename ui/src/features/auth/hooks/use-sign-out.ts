import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { useNavigate } from 'react-router-dom';
import { clearToken } from '../../../lib/auth-token';

/** Forgets the token and every cached answer, then shows the sign-in page. */
export function useSignOut(): () => void {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  return useCallback(() => {
    clearToken();
    navigate('/sign-in', { replace: true });
    queryClient.clear();
  }, [navigate, queryClient]);
}
