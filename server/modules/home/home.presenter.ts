import { cycleStage, dueTests, severityRank } from '@shared/care';
import { HOME_REPLY_EXCERPT_MAX } from '@shared/constants/home';
import type { HomeGoodNews, HomeQuestion, HomeTank, HomeView } from '@shared/schemas/home-views';
import type { ConcernRow } from '../concerns';
import type { GoodNewsRow, HomeData, QuestionRow } from './home.queries';

const excerpt = (text: string) =>
  text.length > HOME_REPLY_EXCERPT_MAX ? `${text.slice(0, HOME_REPLY_EXCERPT_MAX - 1).trimEnd()}…` : text;

function worstOf(concerns: readonly ConcernRow[]): ConcernRow | undefined {
  return [...concerns].sort(
    (a, b) => severityRank(b.severity) - severityRank(a.severity) || +b.raisedAt - +a.raisedAt,
  )[0];
}

function presentQuestion(q: QuestionRow): HomeQuestion {
  return {
    id: q.id,
    tankId: q.tankId,
    tankName: q.tankName,
    title: q.title,
    status: q.status,
    lastActivityAt: new Date(q.lastActivityAt).toISOString(),
    lastReply: q.lastReply
      ? {
          author: { userId: q.lastReply.authorId, displayName: q.lastReply.authorName },
          excerpt: excerpt(q.lastReply.excerpt),
          at: new Date(q.lastReply.at).toISOString(),
        }
      : null,
    unreadNotificationIds: q.unreadNotificationIds,
  };
}

function presentGoodNews(g: GoodNewsRow): HomeGoodNews {
  const base = {
    tankId: g.tankId,
    tankName: g.tankName,
    by: { userId: g.byId, displayName: g.byName },
    at: new Date(g.at).toISOString(),
    note: g.note ?? '',
  };
  return g.kind === 'signed-off'
    ? { kind: 'signed-off', ...base }
    : {
        kind: 'concern-resolved',
        ...base,
        parameter: g.parameter as Extract<HomeGoodNews, { kind: 'concern-resolved' }>['parameter'],
        reason: g.reason ?? '',
      };
}

/** The home from what `loadHome` read: the care engine judges each tank (cycle stage, tests due) at `now`. */
export function presentHome(data: HomeData, now: Date): HomeView {
  const iso = now.toISOString();
  const tanks: HomeTank[] = data.tanks.map(({ tank, hasLivestock }) => {
    const history = data.histories.get(tank.id) ?? [];
    const mine = data.concerns.filter((c) => c.tankId === tank.id);
    const worst = worstOf(mine);
    const last = history.at(-1);
    const profile = data.profiles.get(tank.careProfileKey);
    return {
      id: tank.id,
      name: tank.name,
      systemType: tank.systemType,
      phase: tank.phase,
      cycleStage: cycleStage(history, { now: iso }).stage,
      hasLivestock,
      worstConcern: worst
        ? {
            id: worst.id,
            severity: worst.severity,
            parameter: worst.parameter,
            reason: worst.reason,
            raisedAt: worst.raisedAt.toISOString(),
          }
        : null,
      liveConcerns: mine.length,
      due: dueTests(
        { phase: tank.phase, systemType: tank.systemType, profile, createdAt: tank.createdAt.toISOString() },
        history,
        iso,
      ),
      lastTest: last ? { id: last.id, takenAt: last.takenAt, values: last.values } : null,
    };
  });
  return {
    generatedAt: iso,
    tanks,
    questions: data.questions.map(presentQuestion),
    goodNews: data.goodNews.map(presentGoodNews),
  };
}
