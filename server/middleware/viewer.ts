import { ForbiddenError } from '@casl/ability';
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { DataSource } from 'typeorm';
import { asSubject, type Action, type SubjectMap, type SubjectType } from '@shared/abilities';
import { ABSOLUTE_MS } from '../config/session';
import { errors } from '../lib/app-error';
import { loadViewer, type ViewerContext } from '../modules/access';

export type { ViewerContext };

/** Attaches `req.viewer` when the session is signed in and still within its absolute lifetime. */
export function attachViewer(dataSource: DataSource): RequestHandler {
  return async (req: Request, _res: Response, next: NextFunction) => {
    const userId = req.session?.userId;
    if (!userId) return next();
    const signedInAt = req.session.signedInAt ?? 0;
    if (Date.now() - signedInAt > ABSOLUTE_MS) {
      await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
      return next();
    }
    const context = await loadViewer(dataSource.manager, userId);
    if (!context) {
      await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
      return next();
    }
    req.viewer = context;
    next();
  };
}

export const requireSignIn: RequestHandler = (req, _res, next) => {
  if (!req.viewer) return next(errors.unauthenticated());
  next();
};

export function viewerOf(req: Request): ViewerContext {
  if (!req.viewer) throw errors.unauthenticated();
  return req.viewer;
}

/** Per-object check on the server (ASVS 8.2.2): throws 403 with the reason unless the rules allow it. */
export function authorize<K extends SubjectType>(
  req: Request,
  action: Action,
  type: K,
  object: SubjectMap[K],
): void {
  const { ability } = viewerOf(req);
  ForbiddenError.from(ability)
    .setMessage(`You may not ${action} this ${type.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase()}.`)
    .throwUnlessCan(action, asSubject(type, object));
}

/**
 * Club-scoped guard: the viewer must hold an active membership of :clubId, or the club "does not exist" for them
 * (404, so club ids of other clubs leak nothing).
 */
export const requireClubMember: RequestHandler = (req, _res, next) => {
  const viewer = viewerOf(req);
  const clubId = req.params.clubId;
  const membership = viewer.memberships.find((m) => m.clubId === clubId);
  if (!membership) return next(errors.notFound('That club'));
  if (membership.status !== 'active')
    return next(errors.forbidden('Your membership of this club is suspended.'));
  next();
};
