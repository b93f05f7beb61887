import { useEffect, useId, useState } from 'react';

interface SearchBoxProps {
  label: string;
  value: string;
  onChange: (value: string) => void;
  placeholder?: string;
}

/** A search input that reports after typing pauses (300 ms), so each keystroke is not a request. */
export function SearchBox({ label, value, onChange, placeholder }: SearchBoxProps) {
  const id = useId();
  const [text, setText] = useState(value);
  // The URL changed the value (back button, a link): show it instead of the stale text.
  const [shown, setShown] = useState(value);
  if (value !== shown) {
    setShown(value);
    setText(value);
  }
  useEffect(() => {
    if (text === value) return;
    const t = window.setTimeout(() => onChange(text.trim()), 300);
    return () => window.clearTimeout(t);
  }, [text, value, onChange]);
  return (
    <div className="relative w-full max-w-sm">
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <svg viewBox="0 0 20 20" aria-hidden="true" className="pointer-events-none absolute left-3 top-3 h-5 w-5 text-steel-400">
        <circle cx="8.5" cy="8.5" r="5.5" stroke="currentColor" strokeWidth="2" fill="none" />
        <path d="M13 13l4 4" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
      </svg>
      <input
        id={id}
        type="search"
        value={text}
        placeholder={placeholder}
        onChange={(e) => setText(e.target.value)}
        className="block min-h-11 w-full rounded-md border border-steel-300 bg-white pl-10 pr-3 text-base focus:border-spark-500 focus:outline-none focus:ring-2 focus:ring-spark-300"
      />
    </div>
  );
}
