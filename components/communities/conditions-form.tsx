"use client";

import { useState } from "react";
import { Button, FormError } from "@/components/ui/field";
import { CLIMATE_PRESETS, PRESET_CAUTION } from "@/lib/communities/presets";
import type { ApiError } from "@/lib/client/api";

export type Conditions = Record<string, number | string | undefined>;

const FIELDS: { key: string; label: string; step?: string; optional?: boolean; hint?: string }[] = [
  { key: "latitudeDeg", label: "Latitude (°, north +)", step: "0.01" },
  { key: "longitudeDeg", label: "Longitude (°, east +)", step: "0.01" },
  { key: "elevationFt", label: "Elevation (ft)" },
  { key: "heatingOutdoorDbF", label: "Heating outdoor dry bulb (°F)", hint: "99 % or 99.6 %" },
  { key: "coolingOutdoorDbF", label: "Cooling outdoor dry bulb (°F)", hint: "1 %" },
  { key: "coolingOutdoorWbF", label: "Coincident wet bulb (°F)" },
  { key: "dailyRangeF", label: "Daily range (°F)" },
  { key: "designMonth", label: "Design month (1–12)" },
  { key: "tauBeam", label: "Clear-sky τb (blank = default)", step: "0.001", optional: true },
  { key: "tauDiffuse", label: "Clear-sky τd (blank = default)", step: "0.001", optional: true },
  { key: "groundReflectance", label: "Ground reflectance", step: "0.01" },
  { key: "indoorHeatingF", label: "Indoor heating (°F)" },
  { key: "indoorCoolingF", label: "Indoor cooling (°F)" },
  { key: "indoorCoolingRhPct", label: "Indoor cooling RH (%)" },
];

export const DEFAULT_CONDITIONS: Conditions = {
  designMonth: 7,
  groundReflectance: 0.2,
  indoorHeatingF: 70,
  indoorCoolingF: 75,
  indoorCoolingRhPct: 50,
};

/**
 * Name, location and design conditions of a community. A preset only fills the fields (marked
 * approximate); nothing changes until the form is saved.
 */
export function ConditionsForm({
  initial,
  submitLabel,
  busy,
  error,
  disabled,
  onSubmit,
  showPresets,
}: {
  initial: { name: string; locality: string; conditions: Conditions };
  submitLabel: string;
  busy: boolean;
  error: ApiError | null;
  disabled?: boolean;
  showPresets?: boolean;
  onSubmit: (value: { name: string; locality: string; conditions: Conditions }) => void;
}) {
  const [name, setName] = useState(initial.name);
  const [locality, setLocality] = useState(initial.locality);
  const [values, setValues] = useState<Record<string, string>>(() =>
    Object.fromEntries(
      FIELDS.map((f) => [
        f.key,
        initial.conditions[f.key] === undefined ? "" : String(initial.conditions[f.key]),
      ]),
    ),
  );
  const [presetId, setPresetId] = useState("");
  const [localError, setLocalError] = useState<string | null>(null);
  const fieldError = (key: string) =>
    error?.fieldErrors.find((f) => f.field === `conditions.${key}` || f.field === key)?.message;

  function applyPreset(id: string) {
    setPresetId(id);
    const preset = CLIMATE_PRESETS.find((p) => p.id === id);
    if (!preset) return;
    setValues((v) => ({
      ...v,
      ...Object.fromEntries(Object.entries(preset.conditions).map(([k, x]) => [k, String(x)])),
    }));
  }

  function submit(event: React.FormEvent) {
    event.preventDefault();
    const conditions: Conditions = {};
    for (const f of FIELDS) {
      const text = values[f.key].trim();
      if (text === "") {
        if (!f.optional) {
          setLocalError(`${f.label} is required.`);
          return;
        }
        continue;
      }
      const n = Number(text);
      if (!Number.isFinite(n)) {
        setLocalError(`${f.label}: "${text}" is not a number.`);
        return;
      }
      conditions[f.key] = n;
    }
    setLocalError(null);
    onSubmit({ name: name.trim(), locality: locality.trim(), conditions });
  }

  const preset = CLIMATE_PRESETS.find((p) => p.id === presetId);
  return (
    <form onSubmit={submit} noValidate data-testid="conditions-form">
      <FormError
        message={
          localError ??
          (error && error.fieldErrors.length === 0
            ? error.message
            : error
              ? "Some values are not valid; see the marked fields. Nothing was saved."
              : null)
        }
        testId="conditions-error"
      />
      {showPresets ? (
        <div className="mb-3">
          <label htmlFor="preset" className="mb-1 block text-xs font-medium text-zinc-700">
            Start from a climate preset
          </label>
          <select
            id="preset"
            value={presetId}
            onChange={(e) => applyPreset(e.target.value)}
            className="w-full rounded border border-zinc-300 bg-white px-2 py-1.5"
            disabled={disabled}
          >
            <option value="">None — enter the values yourself</option>
            {CLIMATE_PRESETS.map((p) => (
              <option key={p.id} value={p.id}>
                {p.label} ({p.example}) — approximate
              </option>
            ))}
          </select>
          {preset ? (
            <p
              className="mt-1 rounded border border-amber-200 bg-caution-50 px-2 py-1 text-xs text-caution-800"
              data-testid="preset-caution"
            >
              {PRESET_CAUTION} Enter the values your jurisdiction requires before relying on the loads.
            </p>
          ) : null}
        </div>
      ) : null}
      <div className="grid gap-3 sm:grid-cols-2">
        <div>
          <label htmlFor="community-name" className="mb-1 block text-xs font-medium text-zinc-700">
            Community name
          </label>
          <input
            id="community-name"
            value={name}
            onChange={(e) => setName(e.target.value)}
            disabled={disabled}
            className="w-full rounded border border-zinc-300 px-2 py-1.5"
          />
          {fieldError("name") ? <p className="mt-1 text-xs text-red-700">{fieldError("name")}</p> : null}
        </div>
        <div>
          <label htmlFor="community-locality" className="mb-1 block text-xs font-medium text-zinc-700">
            Locality
          </label>
          <input
            id="community-locality"
            value={locality}
            onChange={(e) => setLocality(e.target.value)}
            disabled={disabled}
            className="w-full rounded border border-zinc-300 px-2 py-1.5"
          />
        </div>
      </div>
      <div className="mt-3 grid gap-3 sm:grid-cols-3 lg:grid-cols-4">
        {FIELDS.map((f) => (
          <div key={f.key}>
            <label htmlFor={`cond-${f.key}`} className="mb-1 block text-xs font-medium text-zinc-700">
              {f.label}
            </label>
            <input
              id={`cond-${f.key}`}
              inputMode="decimal"
              value={values[f.key]}
              disabled={disabled}
              onChange={(e) => setValues((v) => ({ ...v, [f.key]: e.target.value }))}
              aria-invalid={fieldError(f.key) ? true : undefined}
              className={`num w-full rounded border px-2 py-1.5 ${fieldError(f.key) ? "border-red-600" : "border-zinc-300"}`}
            />
            {f.hint ? <p className="mt-0.5 text-[11px] text-zinc-500">{f.hint}</p> : null}
            {fieldError(f.key) ? <p className="mt-1 text-xs text-red-700">{fieldError(f.key)}</p> : null}
          </div>
        ))}
      </div>
      {!disabled ? (
        <Button type="submit" disabled={busy} className="mt-4">
          {busy ? "Saving…" : submitLabel}
        </Button>
      ) : null}
    </form>
  );
}
