import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Recipe } from '@/analysis/import';
import type { SavedRecipe } from '@/server/schemas';
import { api, apiRequest } from '../api-client';

export const recipeKeys = {
  all: ['recipes'] as const,
  list: () => [...recipeKeys.all, 'list'] as const,
};

export const getRecipes = () => api.get<SavedRecipe[]>('/recipes');

export const recipesQuery = () => queryOptions({ queryKey: recipeKeys.list(), queryFn: getRecipes });

/** The shop's saved recipes; staff only (a player gets 403), so pass enabled: false for players. */
export function useRecipesQuery(options: { enabled?: boolean } = {}) {
  return useQuery({ ...recipesQuery(), enabled: options.enabled ?? true });
}

export function useSaveRecipeMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { name: string; recipe: Recipe }) => api.post<SavedRecipe>('/recipes', body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: recipeKeys.all }),
  });
}

export function useDeleteRecipeMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiRequest<void>('DELETE', `/recipes/${encodeURIComponent(id)}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: recipeKeys.all }),
  });
}
