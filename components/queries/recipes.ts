import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Recipe } from '@/analysis/import';
import type { SavedRecipe } from '@/server/schemas';
import { api, apiRequest } from '../api-client';

export const recipeKeys = {
  all: ['recipes'] as const,
  list: () => [...recipeKeys.all, 'list'] as const,
  detail: (id: string) => [...recipeKeys.all, 'detail', id] as const,
};

export const getRecipes = () => api.get<SavedRecipe[]>('/recipes');

export const getRecipe = (id: string) => api.get<SavedRecipe>(`/recipes/${encodeURIComponent(id)}`);

export const recipesQuery = () => queryOptions({ queryKey: recipeKeys.list(), queryFn: getRecipes });
export const recipeQuery = (id: string) => queryOptions({ queryKey: recipeKeys.detail(id), queryFn: () => getRecipe(id) });

/** One saved recipe of the shop, by id (its page opened by address). */
export function useRecipeQuery(id: string) {
  return useQuery(recipeQuery(id));
}

/** Renames a saved recipe (the owner); the list and the recipe refresh. */
export function useRenameRecipeMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (name: string) => api.patch<SavedRecipe>(`/recipes/${encodeURIComponent(id)}`, { name }),
    onSuccess: (recipe) => {
      queryClient.setQueryData(recipeKeys.detail(id), recipe);
      return queryClient.invalidateQueries({ queryKey: recipeKeys.list() });
    },
  });
}

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
    onSuccess: (_nothing, id) => {
      // Gone for good: drop its page's data rather than refetch a 404.
      queryClient.removeQueries({ queryKey: recipeKeys.detail(id) });
      return queryClient.invalidateQueries({ queryKey: recipeKeys.list() });
    },
  });
}
