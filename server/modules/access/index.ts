/** Who may do what: the viewer's rules loaded fresh, and the same rules as SQL for lists. */
export { abilityCondition, whereAllowed, type FieldMap } from './ability-sql';
export { loadViewer, type MembershipView, type ViewerContext } from './viewer.service';
