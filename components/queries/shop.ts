import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Me, ShopInfo } from '@/server/schemas';
import { api } from '../api-client';
import { meKeys } from './me';

export const shopKeys = {
  all: ['shop'] as const,
  detail: () => [...shopKeys.all, 'detail'] as const,
};

export const shopQuery = () => queryOptions({ queryKey: shopKeys.detail(), queryFn: () => api.get<ShopInfo>('/shop') });

export function useShopQuery() {
  return useQuery(shopQuery());
}

/** The address of the shop's zip (a plain link: the browser downloads it with the session cookie). */
export const SHOP_EXPORT_URL = '/api/shop/export';
export const playerExportUrl = (playerId: string) => `/api/players/${encodeURIComponent(playerId)}/export`;

export function useUpdateShopMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: Partial<Pick<ShopInfo, 'defaultUnits' | 'defaultLengthUnit' | 'defaultAltitudeUnit' | 'defaultTemperatureUnit'>>) => api.patch<ShopInfo>('/shop', body),
    onSuccess: (shop) => queryClient.setQueryData(shopKeys.detail(), shop),
  });
}

/** Closing and reopening change what the signed-in owner may open: me is read again. */
function useShopStateMutation(path: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: object) => api.post<ShopInfo>(path, body),
    onSuccess: (shop) => {
      queryClient.setQueryData(shopKeys.detail(), shop);
      queryClient.setQueryData<Me | null>(meKeys.all, (me) => (me ? { ...me, shop: { ...me.shop, closedAt: shop.closedAt } } : me));
    },
  });
}

export const useCloseShopMutation = () => useShopStateMutation('/shop/close');
export const useReopenShopMutation = () => useShopStateMutation('/shop/reopen');
