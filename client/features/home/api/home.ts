import { queryOptions, useQuery, useQueryClient } from '@tanstack/react-query';
import type { HomeView } from '@shared/schemas/home-views';
import { api } from '@client/lib/api-client';
import { useSocketEvent, useSocketReconnect } from '@client/lib/socket';
import { tankKeys } from '@client/lib/tank-keys';

/**
 * Under the club's tank lists: the home is the member's tank list with today's work on it, so whatever refreshes
 * the lists after a save (`useTankRecordsChanged`) refreshes the home too.
 */
export const homeKeys = {
  club: (clubId: string) => [...tankKeys.lists(clubId), 'home'] as const,
};

export const homeQuery = (clubId: string) =>
  queryOptions({
    queryKey: homeKeys.club(clubId),
    queryFn: ({ signal }) => api.get<HomeView>(`/clubs/${clubId}/home`, signal),
    staleTime: 15_000,
  });

export const useHome = (clubId: string) => useQuery(homeQuery(clubId));

/**
 * Keeps the home current the way the desk stays current: a tank of this club changed (a test saved here or on
 * another device, a concern resolved), a notification arrived (a reply), or the connection came back.
 */
export function useLiveHome(clubId: string, onTankChanged?: () => void): void {
  const qc = useQueryClient();
  const refresh = () => void qc.invalidateQueries({ queryKey: homeKeys.club(clubId) });
  useSocketEvent('tankChanged', (p) => {
    if (p.clubId !== clubId) return;
    refresh();
    onTankChanged?.();
  });
  useSocketEvent('notification', ({ notification }) => {
    if (notification.clubId === clubId) refresh();
  });
  useSocketReconnect(() => {
    refresh();
    onTankChanged?.();
  });
}
