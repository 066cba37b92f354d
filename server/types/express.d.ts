import type { ViewerContext } from '../middleware/viewer';

declare global {
  namespace Express {
    interface Request {
      viewer?: ViewerContext;
    }
  }
}
export {};
