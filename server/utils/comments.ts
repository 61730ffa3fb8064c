import type { Comment } from '../models'

/** The API face of a comment: author's name, body (plain text), the point it is pinned to (mm) or null. */
export function commentJson(c: Comment, people: Map<string, { name: string }>) {
  return {
    id: c.id,
    parentId: c.parentId,
    author: people.get(c.authorId ?? '')?.name ?? 'a former member',
    authorId: c.authorId,
    body: c.body,
    at: c.x !== null && c.y !== null ? { x: c.x, y: c.y } : null,
    resolved: c.resolved,
    resolvedBy: c.resolvedBy ? people.get(c.resolvedBy)?.name ?? 'a former member' : null,
    resolvedAt: c.resolvedAt ? c.resolvedAt.toISOString() : null,
    createdAt: c.createdAt.toISOString(),
  }
}
