"use client";
/**
 * A labelled number input with its unit beside it, in the project's display units, holding the
 * stored (US) value. An empty field is `undefined` (for optional values).
 */
import { useId, useState } from "react";
import { fromDisplay, inputValue, unitLabel, type Quantity, type UnitSystem } from "./units";

export interface NumberFieldProps {
  label: string;
  value: number | undefined;
  onChange: (value: number | undefined) => void;
  quantity?: Quantity;
  units?: UnitSystem;
  /** a unit shown for quantities that do not convert ($/yd³, kgCO2e/lb, ...) */
  unit?: string;
  error?: string;
  hint?: string;
  step?: string;
  min?: number;
  disabled?: boolean;
  name?: string;
}

export function NumberField({ label, value, onChange, quantity = "none", units = "US", unit, error, hint, step = "any", min, disabled, name }: NumberFieldProps) {
  const id = useId();
  const [text, setText] = useState(() => inputValue(value, quantity, units));
  // Follow outside changes (reload, units switch) but not while the person is typing a partial number.
  const [seen, setSeen] = useState({ value, quantity, units });
  if (seen.value !== value || seen.quantity !== quantity || seen.units !== units) {
    setSeen({ value, quantity, units });
    const parsed = text.trim() === "" ? undefined : Number(text);
    const stored = parsed === undefined || !Number.isFinite(parsed) ? undefined : fromDisplay(parsed, quantity, units);
    const same = stored === undefined ? value === undefined : value !== undefined && Math.abs(stored - value) <= 1e-9 * Math.max(1, Math.abs(value));
    if (!same || seen.units !== units) setText(inputValue(value, quantity, units));
  }
  const shownUnit = unit ?? unitLabel(quantity, units);
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
        {shownUnit ? <span className="ml-1 font-normal text-ink-500">({shownUnit})</span> : null}
      </label>
      <input
        id={id}
        name={name}
        type="number"
        inputMode="decimal"
        step={step}
        min={min}
        disabled={disabled}
        className="field-input"
        value={text}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined}
        onChange={(e) => {
          setText(e.target.value);
          const raw = e.target.value.trim();
          if (raw === "") return onChange(undefined);
          const n = Number(raw);
          if (Number.isFinite(n)) onChange(fromDisplay(n, quantity, units));
        }}
      />
      {hint && !error ? (
        <p id={`${id}-hint`} className="mt-1 text-xs text-ink-500">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} className="field-error">
          {error}
        </p>
      ) : null}
    </div>
  );
}
