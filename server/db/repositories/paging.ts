import type { ObjectLiteral, SelectQueryBuilder } from 'typeorm';
import type { Page } from '../../../shared/schemas/common.js';

export interface PageRequest {
  page: number;
  pageSize: number;
  sort: string;
}

/** Applies `sort` (`field` or `-field`, already validated against a list) and paging, and counts. */
export async function pageOf<T extends ObjectLiteral>(qb: SelectQueryBuilder<T>, request: PageRequest, tieBreaker = 'id', tieDirection: 'ASC' | 'DESC' = 'ASC'): Promise<Page<T>> {
  const descending = request.sort.startsWith('-');
  const field = descending ? request.sort.slice(1) : request.sort;
  const alias = qb.alias;
  qb.orderBy(`${alias}.${field}`, descending ? 'DESC' : 'ASC').addOrderBy(`${alias}.${tieBreaker}`, tieDirection);
  qb.skip((request.page - 1) * request.pageSize).take(request.pageSize);
  const [items, total] = await qb.getManyAndCount();
  return { items, total, page: request.page, pageSize: request.pageSize };
}

/** `%text%` for a case-insensitive LIKE with `\` as the escape, so % and _ match themselves. */
export function likePattern(text: string): string {
  return `%${text.toLowerCase().replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}
