import { useCallback, useEffect, useRef, useState } from 'react';
import { fetchPdf } from '../api/fetch-pdf';

/**
 * Opens or prints a PDF from the API. The new tab is opened inside the click (so pop-up
 * blockers allow it) and pointed at the PDF once it has arrived; a refusal closes it and
 * the error shows beside the buttons.
 */
export function usePdfActions() {
  const [busy, setBusy] = useState<'open' | 'print' | null>(null);
  const [error, setError] = useState<unknown>(null);
  const urls = useRef<string[]>([]);

  useEffect(
    () => () => {
      for (const u of urls.current) URL.revokeObjectURL(u);
    },
    [],
  );

  const open = useCallback(async (url: string) => {
    setError(null);
    setBusy('open');
    const tab = window.open('', '_blank');
    try {
      const blobUrl = URL.createObjectURL(await fetchPdf(url));
      urls.current.push(blobUrl);
      if (tab) tab.location.href = blobUrl;
      else window.location.assign(blobUrl);
    } catch (e) {
      tab?.close();
      setError(e);
    } finally {
      setBusy(null);
    }
  }, []);

  const print = useCallback(async (url: string) => {
    setError(null);
    setBusy('print');
    try {
      const blobUrl = URL.createObjectURL(await fetchPdf(url));
      urls.current.push(blobUrl);
      const frame = document.createElement('iframe');
      frame.style.position = 'fixed';
      frame.style.width = '0';
      frame.style.height = '0';
      frame.style.border = '0';
      frame.src = blobUrl;
      frame.onload = () => {
        try {
          frame.contentWindow?.focus();
          frame.contentWindow?.print();
        } catch {
          // Some browsers refuse to print a PDF frame: open it instead, the viewer prints.
          window.open(blobUrl, '_blank');
        }
        window.setTimeout(() => frame.remove(), 60_000);
      };
      document.body.appendChild(frame);
    } catch (e) {
      setError(e);
    } finally {
      setBusy(null);
    }
  }, []);

  return { open, print, busy, error };
}
