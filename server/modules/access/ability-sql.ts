import { rulesToAST } from '@casl/ability/extra';
import { Brackets, type SelectQueryBuilder, type WhereExpressionBuilder } from 'typeorm';
import type { Action, AppAbility, SubjectType } from '@shared/abilities';

interface FieldCondition {
  operator: string;
  field: string;
  value: unknown;
}
interface CompoundCondition {
  operator: 'and' | 'or' | 'not';
  value: Condition[];
}
type Condition = FieldCondition | CompoundCondition;

/** Maps a rule's field name to a qualified column, e.g. { clubId: 't.club_id' }. Unknown fields are refused. */
export type FieldMap = Record<string, string>;

const COMPARISONS: Record<string, string> = { eq: '=', ne: '<>', lt: '<', lte: '<=', gt: '>', gte: '>=' };

class SqlBuilder {
  readonly params: Record<string, unknown> = {};
  private n = 0;
  constructor(
    private readonly fields: FieldMap,
    private readonly prefix: string,
  ) {}

  private param(value: unknown): string {
    const name = `${this.prefix}${this.n++}`;
    this.params[name] = value;
    return name;
  }

  private column(field: string): string {
    const column = this.fields[field];
    if (!column) throw new Error(`ability-sql: no column mapped for rule field "${field}"`);
    return column;
  }

  build(c: Condition): string {
    switch (c.operator) {
      case 'and':
      case 'or': {
        const parts = (c as CompoundCondition).value.map((v) => this.build(v));
        if (parts.length === 0) return c.operator === 'and' ? 'TRUE' : 'FALSE';
        return `(${parts.join(c.operator === 'and' ? ' AND ' : ' OR ')})`;
      }
      case 'not': {
        const inner = (c as CompoundCondition).value.map((v) => this.build(v));
        return `NOT (${inner.join(' AND ')})`;
      }
      case 'in':
      case 'nin': {
        const f = c as FieldCondition;
        const list = f.value as unknown[];
        if (list.length === 0) return f.operator === 'in' ? 'FALSE' : 'TRUE';
        return `${this.column(f.field)} ${f.operator === 'in' ? '=' : '<>'} ${f.operator === 'in' ? 'ANY' : 'ALL'}(:${this.param(list)})`;
      }
      default: {
        const f = c as FieldCondition;
        const op = COMPARISONS[f.operator];
        if (!op) throw new Error(`ability-sql: operator "${f.operator}" is not supported`);
        if (f.value === null) {
          if (f.operator === 'eq') return `${this.column(f.field)} IS NULL`;
          if (f.operator === 'ne') return `${this.column(f.field)} IS NOT NULL`;
        }
        return `${this.column(f.field)} ${op} :${this.param(f.value)}`;
      }
    }
  }
}

let seq = 0;

/**
 * The SQL condition equivalent to the viewer's CASL rules for (action, subject), so list queries only ever load
 * rows the viewer may see. "No rule" becomes FALSE: fail closed.
 */
export function abilityCondition(
  ability: AppAbility,
  action: Action,
  subject: SubjectType,
  fields: FieldMap,
): { sql: string; params: Record<string, unknown> } {
  const ast = rulesToAST(ability, action, subject) as Condition | null;
  if (!ast) return { sql: 'FALSE', params: {} };
  const builder = new SqlBuilder(fields, `ab${seq++ % 1_000_000}_`);
  return { sql: builder.build(ast), params: builder.params };
}

/** Adds the rules as `AND (…)` to a query builder, keeping its earlier where clauses. */
export function whereAllowed<T extends object>(
  qb: SelectQueryBuilder<T>,
  ability: AppAbility,
  action: Action,
  subject: SubjectType,
  fields: FieldMap,
): SelectQueryBuilder<T> {
  const { sql, params } = abilityCondition(ability, action, subject, fields);
  return qb.andWhere(new Brackets((w: WhereExpressionBuilder) => w.where(sql, params)));
}
