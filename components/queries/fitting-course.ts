import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Course, CourseMove, Fitting, FittingMessage, Intake, IntakeAnswer, IntakeBody, MessageList, PlainWords, RequestPage } from '@/server/schemas';
import { api } from '../api-client';
import { fittingKeys } from './fittings';
import { playerKeys } from './players';

const enc = encodeURIComponent;

export const courseKeys = {
  all: [...fittingKeys.all, 'remote'] as const,
  course: (id: string) => [...courseKeys.all, 'course', id] as const,
  intake: (id: string) => [...courseKeys.all, 'intake', id] as const,
  messages: (id: string) => [...courseKeys.all, 'messages', id] as const,
  plainWords: (id: string) => [...courseKeys.all, 'plain-words', id] as const,
  requestPage: (slug: string) => ['request-pages', slug] as const,
  requestLink: () => ['shop', 'request-link'] as const,
};

export const courseQuery = (id: string) => queryOptions({ queryKey: courseKeys.course(id), queryFn: () => api.get<Course>(`/fittings/${enc(id)}/course`) });
export const intakeQuery = (id: string) => queryOptions({ queryKey: courseKeys.intake(id), queryFn: () => api.get<IntakeAnswer>(`/fittings/${enc(id)}/intake`) });
export const messagesQuery = (id: string) => queryOptions({ queryKey: courseKeys.messages(id), queryFn: () => api.get<MessageList>(`/fittings/${enc(id)}/messages`) });
export const plainWordsQuery = (id: string) => queryOptions({ queryKey: courseKeys.plainWords(id), queryFn: () => api.get<PlainWords>(`/fittings/${enc(id)}/plain-words`) });

export const useCourseQuery = (id: string) => useQuery(courseQuery(id));
export const useIntakeQuery = (id: string) => useQuery(intakeQuery(id));
export const usePlainWordsQuery = (id: string) => useQuery(plainWordsQuery(id));
/** Messages, looked at again every half minute while the page is open. */
export const useMessagesQuery = (id: string) => useQuery({ ...messagesQuery(id), refetchInterval: 30_000 });
export const useRequestPageQuery = (slug: string) =>
  useQuery({ queryKey: courseKeys.requestPage(slug), queryFn: () => api.get<RequestPage>(`/requests/${enc(slug)}`), enabled: slug !== '' });
export const useRequestLinkQuery = () => useQuery({ queryKey: courseKeys.requestLink(), queryFn: () => api.get<RequestPage>('/shop/request-link') });

/** Staff move the course on (or back with a reason). */
export function useMoveCourseMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (move: CourseMove) => api.post<Course>(`/fittings/${enc(id)}/course`, move),
    onSuccess: (course) => {
      queryClient.setQueryData(courseKeys.course(id), course);
      return queryClient.invalidateQueries({ queryKey: fittingKeys.all });
    },
  });
}

/** The player sends their intake (it updates their profile and the course). */
export function useSendIntakeMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: IntakeBody) => api.put<Intake>(`/fittings/${enc(id)}/intake`, body),
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: fittingKeys.all }), queryClient.invalidateQueries({ queryKey: playerKeys.all })]),
  });
}

export function usePostMessageMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: string) => api.post<FittingMessage>(`/fittings/${enc(id)}/messages`, { body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: courseKeys.messages(id) }),
  });
}

/** Marks what is shown as read; the lists' unread counts follow. */
export function useReadMessagesMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<{ unread: number }>(`/fittings/${enc(id)}/messages/read`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: fittingKeys.all }),
  });
}

/** A player asks for a remote fitting on the shop's request page. */
export function useRequestFittingMutation(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (note: string) => api.post<Fitting>(`/requests/${enc(slug)}`, { note }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: fittingKeys.all }),
  });
}
