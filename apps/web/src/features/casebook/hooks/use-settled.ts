import { useEffect, useState } from 'react';

/**
 * The value, once it has stopped changing for `delay` ms (compared by content, not identity): what
 * a search box asks the API about, so a question goes out per pause in typing, not per keystroke.
 */
export function useSettled<T>(value: T, delay: number): T {
  const [settled, setSettled] = useState(value);
  const key = JSON.stringify(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(JSON.parse(key) as T), delay);
    return () => clearTimeout(timer);
  }, [key, delay]);
  return settled;
}
