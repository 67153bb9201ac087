// Fetches one export file (bench CSV or Touchstone) and hands it to the browser's download.
import { useMutation } from '@tanstack/react-query';
import { downloadBlob } from '../../response/utils/downloadBlob.js';
import { fetchExportText } from './fetchExportText.js';

/** What to download: the API path, the media type and the file name to use when the server proposes none. */
export type ExportDownload = { path: string; mediaType: string; fallbackName: string };

/** GETs the file (any member) and saves it; a refusal (e.g. 400 for a bad span, 422 for a limit) is the mutation's error. */
export function useExportDownload() {
  return useMutation({
    mutationFn: async ({ path, mediaType, fallbackName }: ExportDownload): Promise<string> => {
      const { text, fileName } = await fetchExportText(path);
      const name = fileName ?? fallbackName;
      downloadBlob(new Blob([text], { type: mediaType }), name);
      return name;
    },
  });
}
