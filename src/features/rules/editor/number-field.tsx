import { useEffect, useState, type ReactNode } from "react";
import { TextField } from "@/components/ui/text-field.tsx";

const shown = (value: number) => (Number.isFinite(value) ? String(value) : "");

/**
 * A number typed as text (so "1." or "-" can be on the way to a number), handed on as a number,
 * NaN while empty or unreadable; the schema then refuses it and the message says to enter a number.
 */
export function NumberField({
  label,
  value,
  onChange,
  error,
  hint,
  className = "",
  disabled,
  integer = false,
}: {
  label: string;
  value: number;
  onChange: (value: number) => void;
  error?: string;
  hint?: ReactNode;
  className?: string;
  disabled?: boolean;
  integer?: boolean;
}) {
  const [text, setText] = useState(shown(value));
  // Follow outside changes (a reset, a kind switch) without fighting the text being typed.
  useEffect(() => {
    setText((current) => (Number(current.trim() === "" ? Number.NaN : current) === value || (current === "" && Number.isNaN(value)) ? current : shown(value)));
  }, [value]);
  const message = error ? (Number.isFinite(value) ? error : "Enter a number") : undefined;
  return (
    <TextField
      label={label}
      mono
      inputMode={integer ? "numeric" : "decimal"}
      autoComplete="off"
      value={text}
      disabled={disabled}
      error={message}
      hint={hint}
      className={className}
      onChange={(event) => {
        setText(event.target.value);
        const trimmed = event.target.value.trim();
        onChange(trimmed === "" ? Number.NaN : Number(trimmed));
      }}
    />
  );
}
