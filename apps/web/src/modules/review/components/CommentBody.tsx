// A comment's text with the teammates it mentions highlighted.
import { mentionSegments } from '../utils/mentionSegments.js';

/** Mentioned logins (as the server listed them) are shown as marked `@login` runs. */
export function CommentBody({ body, mentions }: { body: string; mentions: readonly string[] }) {
  return (
    <p className="hx-comment-body">
      {mentionSegments(body, mentions).map((s, i) =>
        s.mention ? (
          <mark key={i} className="hx-mention" title={`Mentions ${s.mention}`}>
            {s.text}
          </mark>
        ) : (
          <span key={i}>{s.text}</span>
        ),
      )}
    </p>
  );
}
