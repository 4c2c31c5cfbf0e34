import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ShopMarginsBody, ShopMarginsView } from '@/server/schemas';
import { api } from '../api-client';
import { analysisKeys } from './analysis';

export const shopMarginKeys = {
  all: ['shop-margins'] as const,
  detail: () => [...shopMarginKeys.all, 'detail'] as const,
};

export const getShopMargins = () => api.get<ShopMarginsView>('/shop/margins');

export const shopMarginsQuery = () => queryOptions({ queryKey: shopMarginKeys.detail(), queryFn: getShopMargins });

/** The shop's margins and odds targets (staff). */
export function useShopMarginsQuery(options: { enabled?: boolean } = {}) {
  return useQuery({ ...shopMarginsQuery(), enabled: options.enabled ?? true });
}

/** The owner saves the shop's margins; every analysis reads them again. */
export function useSaveShopMarginsMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ShopMarginsBody) => api.put<ShopMarginsView>('/shop/margins', body),
    onSuccess: (view) => {
      queryClient.setQueryData(shopMarginKeys.detail(), view);
      return queryClient.invalidateQueries({ queryKey: analysisKeys.all });
    },
  });
}
