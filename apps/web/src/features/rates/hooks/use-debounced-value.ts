import { useEffect, useState } from 'react';

/** The value as it was `delayMs` after it last changed: for asking the server once typing pauses. */
export function useDebouncedValue<T>(value: T, delayMs = 400): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}
