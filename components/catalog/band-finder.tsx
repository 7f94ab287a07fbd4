"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { SHADE_LABELS, type Shade } from "@/lib/catalog/spec-words";
import { bandChoiceFromClimate, writeBandChoice } from "@/lib/climate/band-cookie";
import type { Climate } from "@/lib/climate/resolve";
import { MONTH_WORDS } from "@/lib/climate/warmest-month";
import { fetchJson, isApiError } from "@/lib/http/client";

type Mode = "zip" | "temperature";


/** ZIP code or warmest-month high → climate band, with the stations used; remembers the band for the store. */
export function BandFinder({ compact = false }: { compact?: boolean }) {
  const router = useRouter();
  const [mode, setMode] = useState<Mode>("zip");
  const [zip, setZip] = useState("");
  const [temp, setTemp] = useState("");
  const [unit, setUnit] = useState<"F" | "C">("F");
  const [answer, setAnswer] = useState<Climate | null>(null);
  const [error, setError] = useState<{ field: Mode; message: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function lookUp(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    setError(null);
    const params = mode === "zip" ? `zip=${encodeURIComponent(zip.trim())}` : `${unit === "F" ? "highF" : "highC"}=${encodeURIComponent(temp.trim())}`;
    try {
      const body = await fetchJson<Climate>(`/api/climate?${params}`);
      setAnswer(body);
      writeBandChoice(bandChoiceFromClimate(body));
      router.refresh();
    } catch (error) {
      if (isApiError(error) && error.status !== 0) {
        setAnswer(null);
        setError({ field: mode, message: error.message });
        if (error.code === "unavailable") setMode("temperature");
        return;
      }
      setError({ field: mode, message: "The store could not be reached. Check your connection and try again." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-col gap-6">
      <form onSubmit={lookUp} noValidate className="flex flex-col gap-4 rounded-xl border border-paper-200 bg-white p-5 shadow-card" aria-label="Find your climate band">
        <fieldset className="flex flex-wrap gap-4">
          <legend className="mb-2 font-bold">Look up by</legend>
          <label className="flex items-center gap-2">
            <input type="radio" name="mode" checked={mode === "zip"} onChange={() => setMode("zip")} className="size-5 accent-moss-700" /> ZIP code
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" name="mode" checked={mode === "temperature"} onChange={() => setMode("temperature")} className="size-5 accent-moss-700" /> My summer high
          </label>
        </fieldset>
        {mode === "zip" ? (
          <Field label="ZIP code" hint="Five digits, U.S. only." error={error?.field === "zip" ? error.message : undefined}>
            <Input inputMode="numeric" autoComplete="postal-code" maxLength={10} value={zip} onChange={(e) => setZip(e.target.value)} className="max-w-40" />
          </Field>
        ) : (
          <div className="flex flex-wrap items-end gap-3">
            <Field label="Average daily high of your warmest month" hint="July north of the equator, January south of it; from a weather service or almanac for your town." error={error?.field === "temperature" ? error.message : undefined}>
              <Input inputMode="decimal" value={temp} onChange={(e) => setTemp(e.target.value)} className="max-w-32" />
            </Field>
            <div className="flex flex-col gap-1.5">
              <label htmlFor="temp-unit" className="font-bold">
                Unit
              </label>
              <Select id="temp-unit" value={unit} onChange={(e) => setUnit(e.target.value as "F" | "C")}>
                <option value="F">°F</option>
                <option value="C">°C</option>
              </Select>
            </div>
          </div>
        )}
        {error && error.field !== mode ? <p className="font-bold text-berry-700">{error.message}</p> : null}
        <div>
          <Button type="submit" loading={busy}>
            Find my band
          </Button>
        </div>
      </form>
      <div aria-live="polite">{answer ? <BandAnswer answer={answer} compact={compact} /> : null}</div>
    </div>
  );
}

function BandAnswer({ answer, compact }: { answer: Climate; compact: boolean }) {
  const month = MONTH_WORDS[answer.warmestMonth];
  const zip = answer.source.kind === "zip" ? answer.source.zip : undefined;
  return (
    <section className="flex flex-col gap-4 rounded-xl border border-moss-200 bg-moss-50 p-5" aria-labelledby="band-result" data-testid="band-result">
      <h2 id="band-result" className="font-display text-2xl font-semibold text-moss-900">
        {answer.band.label}
      </h2>
      <p>
        Average daily high in {month}, the warmest month: {answer.display.text}{zip ? ` near ${zip}` : ""}. {answer.band.explanation}
      </p>
      <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-[auto_1fr]">
        <dt className="font-bold">Outside shades that suit</dt>
        <dd>{answer.band.shades.map((s) => SHADE_LABELS[s as Shade]).join(", ")}</dd>
        <dt className="font-bold">Vents</dt>
        <dd>{answer.band.ventsNeeded ? "Needed" : "Optional"}{answer.band.afternoonShade ? "; hang it where it gets afternoon shade" : ""}</dd>
      </dl>
      {answer.nearEdge ? <Alert tone="warn" title="A close call">{answer.nearEdge.note}</Alert> : null}
      {answer.stations.length > 0 && !compact ? (
        <Table caption="Weather stations used, nearest first">
          <THead>
            <Tr>
              <Th>Station</Th>
              <Th>Distance</Th>
              <Th>{month} high</Th>
              <Th>Data flag</Th>
            </Tr>
          </THead>
          <TBody>
            {answer.stations.map((s) => (
              <Tr key={s.id}>
                <Td>
                  {s.name}, {s.state}
                </Td>
                <Td numeric>{s.distanceMi.toFixed(1)} mi ({(s.distanceMi * 1.609344).toFixed(1)} km)</Td>
                <Td numeric>{s.highF.toFixed(1)} °F</Td>
                <Td>{s.flag}</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      ) : null}
      {answer.credit ? <p className="text-sm text-ink-soft">Weighted by distance from the three nearest stations. Data: {answer.credit}.</p> : null}
      <div>
        <Link href={`/houses?band=${answer.band.id}`} className="font-bold text-moss-800 underline underline-offset-4">
          See houses for {answer.band.label.toLowerCase()}
        </Link>
      </div>
    </section>
  );
}
