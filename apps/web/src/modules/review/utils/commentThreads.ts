// Groups a version's comments into threads: each first comment with every reply under it.
import type { Comment } from '@hexloom/contracts';

/** One thread: the comment that starts it and its replies, oldest first. */
export type CommentThread = { root: Comment; replies: Comment[] };

/**
 * Threads of `comments` in the order their first comments were written. A reply to a reply joins the thread of its
 * first comment; a reply whose parent is missing from the list starts a thread of its own.
 */
export function commentThreads(comments: readonly Comment[]): CommentThread[] {
  const byId = new Map(comments.map((c) => [c.id, c]));
  const rootOf = (c: Comment): Comment => {
    let current = c;
    const seen = new Set<string>();
    while (current.parentId !== null && !seen.has(current.id)) {
      seen.add(current.id);
      const parent = byId.get(current.parentId);
      if (!parent) break;
      current = parent;
    }
    return current;
  };
  const threads = new Map<string, CommentThread>();
  for (const c of comments) {
    const root = rootOf(c);
    const thread = threads.get(root.id) ?? { root, replies: [] };
    if (c.id !== root.id) thread.replies.push(c);
    threads.set(root.id, thread);
  }
  return [...threads.values()];
}

