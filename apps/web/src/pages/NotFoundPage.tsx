// Any unknown path.
import { HexloomLogo } from '../modules/brand/components/HexloomLogo.js';
import { NotFoundState } from '../modules/core/components/NotFoundState.js';
import { useDocumentTitle } from '../modules/core/hooks/useDocumentTitle.js';

/** The 404 page, outside the signed-in frame so it works for everyone. */
export function NotFoundPage() {
  useDocumentTitle('Page not found');
  return (
    <main className="hx-page" style={{ textAlign: 'center' }}>
      <HexloomLogo sizePx={48} gapColour="var(--hx-bg)" title="Hexloom logo" />
      <NotFoundState />
    </main>
  );
}
