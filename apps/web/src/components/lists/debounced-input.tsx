import { useEffect, useState, type InputHTMLAttributes } from "react";
import { Input } from "@/components/ui/field";

/** Delay between the last keystroke and the search it sends: one request per pause, not per key. */
export const TYPING_PAUSE_MS = 300;

/**
 * A text box that reports its value after the user pauses typing. When the value changes
 * from outside (Back, a cleared filter) the box follows it.
 */
export function DebouncedInput({
  value,
  onCommit,
  ...props
}: Omit<InputHTMLAttributes<HTMLInputElement>, "value" | "onChange"> & { value: string; onCommit: (value: string) => void }) {
  const [text, setText] = useState(value);
  // Adjusting state while rendering (React's documented pattern) keeps the box in step with
  // the URL without an extra effect pass.
  const [seen, setSeen] = useState(value);
  if (seen !== value) {
    setSeen(value);
    setText(value);
  }
  useEffect(() => {
    if (text.trim() === value) return;
    const timer = setTimeout(() => onCommit(text), TYPING_PAUSE_MS);
    return () => clearTimeout(timer);
  }, [text, value, onCommit]);
  return <Input {...props} value={text} onChange={(e) => setText(e.target.value)} />;
}
