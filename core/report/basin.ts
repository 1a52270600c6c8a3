/**
 * Report section on background build-up in an enclosed basin (`ambient.basin`): the box-model numbers,
 * how the raised background enters the verdict, and the model's assumptions in words.
 */
import type { BasinResult } from "../result/contract";
import { html, join, reportNumber, type RawHtml } from "./format";

export function basinHtml(b: BasinResult): RawHtml {
  const days = (s: number) => reportNumber(s / 86400);
  const rows = b.constituents.map(
    (c) =>
      html`<tr><td>${c.constituent}</td><td>${c.unit}</td><td class="num">${reportNumber(c.naturalBackground)}</td><td class="num">${reportNumber(c.increase)}</td><td class="num">${reportNumber(c.raisedBackground)}</td></tr>`,
  );
  return join([
    html`<p id="basin-assumption"><strong>Assumption:</strong> the receiving water is an enclosed basin treated as one well-mixed box (${b.method}). ${b.limits}</p>`,
    html`<table class="kv" id="basin-table"><caption>Box model of the basin</caption><thead><tr><th>Quantity</th><th class="num">Value</th><th>Unit</th></tr></thead><tbody>
<tr><td>Basin volume</td><td class="num" data-path="basin.volume">${reportNumber(b.volume)}</td><td>m³</td></tr>
<tr><td>Flushing time</td><td class="num">${days(b.flushingTime)}</td><td>days</td></tr>
<tr><td>Exchange flow with the open sea</td><td class="num" data-path="basin.exchangeFlow">${reportNumber(b.exchangeFlow)}</td><td>m³/s</td></tr>
<tr><td>Steady increase of the salinity background</td><td class="num" data-path="basin.backgroundIncrease">${reportNumber(b.backgroundIncrease)}</td><td>g/kg</td></tr>
<tr><td>Time to reach 95 % of it</td><td class="num">${days(b.timeTo95Percent)}</td><td>days</td></tr>
</tbody></table>`,
    html`<table id="basin-constituents"><caption>Natural and raised backgrounds</caption><thead><tr><th>Constituent</th><th>Unit</th><th class="num">Natural</th><th class="num">Increase</th><th class="num">Raised</th></tr></thead><tbody>${join(rows)}</tbody></table>`,
    html`<p>The compliance at the mixing-zone edge uses the raised background while each limit stays relative to the natural background: required dilution = (C<sub>discharge</sub> − C<sub>raised</sub>) / (C<sub>natural</sub> + allowed increase − C<sub>raised</sub>). When the build-up alone uses up the allowed increase, no dilution meets the limit.</p>`,
    html`<p class="note">Source: ${b.source}</p>`,
  ]);
}
