import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PersonRef } from '@shared/schemas/notification-views';
import type { QuestionDetailView, QuestionSummaryView, ReplyView } from '@shared/schemas/question-views';
import type { AskQuestionInput, ReplyInput } from '@shared/schemas/question.schema';
import { api } from '@client/lib/api-client';

export type ListStatus = 'open' | 'all';

export const questionKeys = {
  all: (clubId: string) => ['questions', clubId] as const,
  lists: (clubId: string) => [...questionKeys.all(clubId), 'list'] as const,
  list: (clubId: string, filter: { status: ListStatus; tankId?: string }) =>
    [...questionKeys.lists(clubId), filter] as const,
  detail: (clubId: string, questionId: string) => [...questionKeys.all(clubId), 'one', questionId] as const,
};

const base = (clubId: string) => `/clubs/${clubId}/questions`;

export const questionListQuery = (clubId: string, filter: { status: ListStatus; tankId?: string }) =>
  queryOptions({
    queryKey: questionKeys.list(clubId, filter),
    queryFn: ({ signal }) => {
      const qs = new URLSearchParams({ status: filter.status });
      if (filter.tankId) qs.set('tankId', filter.tankId);
      return api
        .get<{ questions: QuestionSummaryView[] }>(`${base(clubId)}?${qs}`, signal)
        .then((r) => r.questions);
    },
    enabled: Boolean(clubId),
  });

export const questionQuery = (clubId: string, questionId: string) =>
  queryOptions({
    queryKey: questionKeys.detail(clubId, questionId),
    queryFn: ({ signal }) => api.get<QuestionDetailView>(`${base(clubId)}/${questionId}`, signal),
    enabled: Boolean(clubId && questionId),
  });

export const useQuestions = (clubId: string, filter: { status: ListStatus; tankId?: string }) =>
  useQuery(questionListQuery(clubId, filter));
export const useQuestion = (clubId: string, questionId: string) =>
  useQuery(questionQuery(clubId, questionId));

export function useAskQuestion(clubId: string, tankId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: AskQuestionInput) =>
      api.post<{ question: QuestionSummaryView & { body: string }; mentioned: PersonRef[] }>(
        `/clubs/${clubId}/tanks/${tankId}/questions`,
        input,
      ),
    onSuccess: () => qc.invalidateQueries({ queryKey: questionKeys.lists(clubId) }),
  });
}

export function useReply(clubId: string, questionId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: ReplyInput) =>
      api.post<{ reply: ReplyView; question: QuestionSummaryView; mentioned: PersonRef[] }>(
        `${base(clubId)}/${questionId}/replies`,
        input,
      ),
    onSuccess: ({ reply, question }) => {
      qc.setQueryData(
        questionKeys.detail(clubId, questionId),
        (d: QuestionDetailView | undefined) =>
          d && {
            ...d,
            question: { ...d.question, ...question },
            replies: d.replies.some((r) => r.id === reply.id) ? d.replies : [...d.replies, reply],
          },
      );
      void qc.invalidateQueries({ queryKey: questionKeys.lists(clubId) });
    },
  });
}

export function useMarkAnswered(clubId: string, questionId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (answered: boolean) =>
      api.post<{ question: QuestionSummaryView }>(`${base(clubId)}/${questionId}/answered`, { answered }),
    onSuccess: ({ question }) => {
      qc.setQueryData(
        questionKeys.detail(clubId, questionId),
        (d: QuestionDetailView | undefined) => d && { ...d, question: { ...d.question, ...question } },
      );
      void qc.invalidateQueries({ queryKey: questionKeys.lists(clubId) });
    },
  });
}
