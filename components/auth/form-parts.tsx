"use client";
/**
 * Form building blocks shared by the sign-in, account and member forms: a labelled field with its
 * error beside it, a form-level alert, and the glue that puts the server's field issues on the
 * fields they name (the server validates with the same zod schema as the form).
 */
import { useId, useSyncExternalStore, type InputHTMLAttributes, type ReactNode, type Ref, type SelectHTMLAttributes } from "react";
import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { ApiError } from "@/components/providers";

export interface TextFieldProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  error?: string;
  hint?: ReactNode;
  ref?: Ref<HTMLInputElement>;
}

export function TextField({ label, error, hint, id, ref, className, ...input }: TextFieldProps) {
  const generated = useId();
  const fieldId = id ?? generated;
  const hintId = hint ? `${fieldId}-hint` : undefined;
  const errorId = error ? `${fieldId}-error` : undefined;
  return (
    <div className={className}>
      <label htmlFor={fieldId} className="field-label">
        {label}
      </label>
      <input
        id={fieldId}
        ref={ref}
        className="field-input"
        aria-invalid={error ? true : undefined}
        aria-describedby={[hintId, errorId].filter(Boolean).join(" ") || undefined}
        {...input}
      />
      {hint ? (
        <p id={hintId} className="mt-1 text-xs text-ink-500">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={errorId} className="field-error" role="alert">
          {error}
        </p>
      ) : null}
    </div>
  );
}

export interface SelectFieldProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  error?: string;
  options: readonly { value: string; label: string }[];
  ref?: Ref<HTMLSelectElement>;
}

export function SelectField({ label, error, options, id, ref, className, ...select }: SelectFieldProps) {
  const generated = useId();
  const fieldId = id ?? generated;
  const errorId = error ? `${fieldId}-error` : undefined;
  return (
    <div className={className}>
      <label htmlFor={fieldId} className="field-label">
        {label}
      </label>
      <select id={fieldId} ref={ref} className="field-input" aria-invalid={error ? true : undefined} aria-describedby={errorId} {...select}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {error ? (
        <p id={errorId} className="field-error" role="alert">
          {error}
        </p>
      ) : null}
    </div>
  );
}

export interface FormAlertProps {
  tone?: "error" | "success" | "info";
  children: ReactNode;
}

export function FormAlert({ tone = "error", children }: FormAlertProps) {
  const styles = {
    error: "border-strained-600/40 bg-strained-600/5 text-strained-600",
    success: "border-sound-600/40 bg-sound-600/5 text-sound-600",
    info: "border-stone-300 bg-stone-50 text-ink-700",
  }[tone];
  return (
    <div role={tone === "error" ? "alert" : "status"} className={`rounded-md border px-3 py-2 text-sm ${styles}`}>
      {children}
    </div>
  );
}

/**
 * Puts each server issue on the field it names; returns the message for the form as a whole when
 * no issue matched a field (or the error was not an ApiError).
 */
export function applyServerErrors<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, fields: readonly Path<T>[]): string | null {
  if (!(error instanceof ApiError)) return "the server could not be reached; check your connection and try again";
  let placed = false;
  for (const issue of error.issues) {
    const field = fields.find((f) => f === issue.path);
    if (field) {
      setError(field, { type: "server", message: issue.message });
      placed = true;
    }
  }
  return placed ? null : error.message;
}

const noSubscription = () => () => undefined;

/**
 * False during server rendering and until React has hydrated. Submit buttons stay disabled until
 * then, so a click before the scripts load never falls back to a plain form submission.
 */
export function useHydrated(): boolean {
  return useSyncExternalStore(noSubscription, () => true, () => false);
}
