// The browser tab's title for the page being shown.
import { useEffect } from 'react';

/** Sets `document.title` to "<title> · Hexloom" while the page is mounted. */
export function useDocumentTitle(title: string | undefined): void {
  useEffect(() => {
    document.title = title ? `${title} · Hexloom` : 'Hexloom';
  }, [title]);
}
