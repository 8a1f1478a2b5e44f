/**
 * Rounding for display, in one place. The core keeps numbers unrounded; screens, the customer's page, mail
 * and exports all format through these functions so a figure reads the same everywhere.
 * No runtime import from lib/towing: this file must stay light enough for the customer's page.
 */
import type { Margin, Quantity } from "@/lib/towing/types";

const MINUS = "\u2212";

/** Decimals shown per unit: whole pounds, kilograms and millimetres; tenths of inches, percent and degrees. */
export function decimalsFor(unit: string): number {
  if (unit === "lb" || unit === "kg" || unit === "mm") return 0;
  return 1;
}

const formatters = new Map<number, Intl.NumberFormat>();
function formatter(decimals: number) {
  let f = formatters.get(decimals);
  if (!f) {
    f = new Intl.NumberFormat("en-US", { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
    formatters.set(decimals, f);
  }
  return f;
}

/** "3,500", "−12.5": a figure for the unit, with a true minus sign. Non-finite values read "—". */
export function formatNumber(value: number, unit = "", decimals = decimalsFor(unit)): string {
  if (!Number.isFinite(value)) return "—";
  const rounded = Number(value.toFixed(decimals));
  const text = formatter(decimals).format(Math.abs(rounded));
  return rounded < 0 ? `${MINUS}${text}` : text;
}

/** "3,500 lb", "6.0 in", "12.5 %". */
export function formatQuantity(quantity: Quantity | undefined | null): string {
  if (!quantity) return "—";
  return quantity.unit ? `${formatNumber(quantity.value, quantity.unit)} ${quantity.unit}` : formatNumber(quantity.value);
}

/** A share as a percentage: 0.125 → "12.5 %". */
export function formatRatio(ratio: number, decimals = 1): string {
  return `${formatNumber(ratio * 100, "%", decimals)} %`;
}

/** "+200 lb (4.0 %)" when there is room, "−300 lb (−6.0 %)" when over. */
export function formatMargin(margin: Margin | undefined | null): string {
  if (!margin) return "—";
  const sign = margin.value > 0 ? "+" : "";
  return `${sign}${formatNumber(margin.value, margin.unit)} ${margin.unit} (${sign}${formatRatio(margin.ratio)})`.replace(" ()", "");
}

/** A signed figure with its unit, for changes: "+1,076 lb", "−276 lb". */
export function formatChange(quantity: Quantity): string {
  const sign = quantity.value > 0 ? "+" : "";
  return `${sign}${formatQuantity(quantity)}`;
}

/** The words a saved check's vehicle label falls back to when the vehicle was typed in, not named. */
const UNNAMED_VEHICLES = new Set(["Typed vehicle", ""]);

/**
 * A saved check's title: the customer it was saved for, then the rig ("Dana Whitlock: platform rack on a
 * Harrow pickup"). Without a customer, the rig alone. A vehicle typed in without a name reads "their vehicle"
 * for a customer and "a vehicle typed in" otherwise, never the stored fallback label.
 */
export function savedCheckTitle(check: { customerName?: string | null; vehicleLabel?: string | null; hitchedLabel?: string | null }): string {
  const customer = check.customerName?.trim();
  const vehicle = check.vehicleLabel?.trim() ?? "";
  const hitched = check.hitchedLabel?.trim() || "Nothing hitched";
  const named = !UNNAMED_VEHICLES.has(vehicle);
  const on = named ? vehicle : customer ? "their vehicle" : "a vehicle typed in";
  if (customer) return `${customer}: ${lowerFirst(hitched)} on ${on}`;
  return `${hitched} on ${on}`;
}

/** "Platform rack" → "platform rack"; a leading acronym ("GVWR…") keeps its capitals. */
function lowerFirst(text: string): string {
  if (/^[A-Z]{2}/.test(text)) return text;
  return text.charAt(0).toLowerCase() + text.slice(1);
}
