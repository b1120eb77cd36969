import { useId, type InputHTMLAttributes, type ReactNode, type Ref } from "react";

export interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "id"> {
  label: string;
  error?: string;
  hint?: ReactNode;
  ref?: Ref<HTMLInputElement>;
  /** Use the monospace face (usernames, identifiers, numbers). */
  mono?: boolean;
}

/** A labelled input with its hint and error tied to it for screen readers. */
export function TextField({ label, error, hint, mono = false, className = "", ref, ...inputProps }: TextFieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-xs font-medium text-muted">
        {label}
      </label>
      <input
        id={id}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`h-9 rounded border bg-canvas px-2.5 text-ink placeholder:text-muted/70 ${
          error ? "border-danger" : "border-line"
        } ${mono ? "font-mono" : ""}`}
        {...inputProps}
      />
      {hint && !error && (
        <p id={hintId} className="text-xs text-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="text-xs text-danger">
          {error}
        </p>
      )}
    </div>
  );
}
