import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import { sendWaitingOnce, type SendReport } from '../queue/send-queue';

export interface SenderState {
  online: boolean;
  sending: boolean;
  /** The last round of sending, for its words ("3 sent", "no connection"). */
  last: (SendReport & { at: number }) | null;
  send: () => Promise<void>;
}

/** How often a walk with entries waiting tries again while the browser thinks it is online. */
const RETRY_MS = 20_000;

/**
 * Sends the queue when the walk opens, when the connection comes back, after every new entry and
 * every 20 s while something waits; afterwards the trial's values load again.
 */
export function useSender(trialId: number, waiting: number): SenderState {
  const queryClient = useQueryClient();
  const [online, setOnline] = useState(() => navigator.onLine);
  const [sending, setSending] = useState(false);
  const [last, setLast] = useState<SenderState['last']>(null);
  const mounted = useRef(true);

  const send = useCallback(async () => {
    setSending(true);
    try {
      const report = await sendWaitingOnce();
      if (!mounted.current) return;
      setLast({ ...report, at: Date.now() });
      if (report.sent.length || report.photosSent || report.conflicts) await queryClient.invalidateQueries({ queryKey: ['trials', trialId] });
    } finally {
      if (mounted.current) setSending(false);
    }
  }, [queryClient, trialId]);

  useEffect(() => {
    mounted.current = true;
    const up = () => {
      setOnline(true);
      void send();
    };
    const down = () => setOnline(false);
    window.addEventListener('online', up);
    window.addEventListener('offline', down);
    return () => {
      mounted.current = false;
      window.removeEventListener('online', up);
      window.removeEventListener('offline', down);
    };
  }, [send]);

  // Something new waits: try at once, then now and then.
  useEffect(() => {
    if (waiting === 0) return;
    void send();
    const id = window.setInterval(() => void send(), RETRY_MS);
    return () => window.clearInterval(id);
  }, [waiting, send]);

  return { online, sending, last, send };
}
