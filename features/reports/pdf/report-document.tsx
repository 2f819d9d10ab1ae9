import {
  Document,
  Image,
  Page,
  Rect,
  StyleSheet,
  Svg,
  Text,
  View,
  Line,
} from "@react-pdf/renderer";
import {
  formatDepth,
  formatDistance,
  formatHours,
  formatLength,
  formatMass,
  formatReportMoney,
  formatReportRate,
  formatSpeed,
  LAYOUT_NAMES,
  POSITION_NAMES,
  type TReportContent,
  type TReportOption,
} from "@/lib/reports";

type TSystem = "metric" | "imperial";

const INK = "#1f2a24";
const MUTED = "#55635b";
const ACCENT = "#2f6b4f";
const SOFT = "#e7efe9";
const CAUTION = "#8a5a00";

const s = StyleSheet.create({
  page: { fontFamily: "Roboto", fontSize: 9, color: INK, padding: 36, paddingBottom: 54 },
  h1: { fontSize: 18, fontWeight: 700, marginBottom: 4 },
  h2: { fontSize: 12, fontWeight: 700, marginTop: 14, marginBottom: 6, color: ACCENT },
  muted: { color: MUTED },
  row: { flexDirection: "row" },
  th: { fontWeight: 700, backgroundColor: SOFT, padding: 3 },
  td: { padding: 3, borderBottomWidth: 0.5, borderBottomColor: "#cfd8d2" },
  footer: {
    position: "absolute",
    left: 36,
    right: 36,
    bottom: 24,
    flexDirection: "row",
    justifyContent: "space-between",
    fontSize: 7.5,
    color: MUTED,
  },
  caution: {
    borderLeftWidth: 2,
    borderLeftColor: CAUTION,
    paddingLeft: 6,
    marginBottom: 4,
  },
  superseded: {
    backgroundColor: "#fbeedd",
    color: CAUTION,
    padding: 6,
    marginBottom: 8,
    fontWeight: 700,
  },
});

function Table({ widths, head, rows }: { widths: number[]; head: string[]; rows: string[][] }) {
  return (
    <View>
      <View style={s.row}>
        {head.map((h, i) => (
          <Text key={i} style={[s.th, { width: `${widths[i]}%` }]}>
            {h}
          </Text>
        ))}
      </View>
      {rows.map((r, ri) => (
        <View key={ri} style={s.row} wrap={false}>
          {r.map((c, i) => (
            <Text key={i} style={[s.td, { width: `${widths[i]}%` }]}>
              {c}
            </Text>
          ))}
        </View>
      ))}
    </View>
  );
}

/** Horizontal bars drawn as PDF vector paths (not a picture): one bar per label. */
function BarsChart({
  title,
  bars,
  format,
}: {
  title: string;
  bars: { label: string; value: number; highlight?: boolean }[];
  format: (v: number) => string;
}) {
  const width = 520;
  const rowH = 18;
  const labelW = 150;
  const valueW = 90;
  const max = Math.max(...bars.map((b) => (Number.isFinite(b.value) ? b.value : 0)), 1e-9);
  const height = bars.length * rowH + 4;
  return (
    <View wrap={false} style={{ marginBottom: 6 }}>
      <Text style={{ fontWeight: 700, marginBottom: 3 }}>{title}</Text>
      <View style={s.row}>
        <View style={{ width: labelW }}>
          {bars.map((b, i) => (
            <Text key={i} style={{ height: rowH, paddingTop: 4 }}>
              {b.label}
            </Text>
          ))}
        </View>
        <Svg width={width - labelW - valueW} height={height}>
          <Line x1={0} y1={0} x2={0} y2={height} stroke={MUTED} strokeWidth={0.5} />
          {bars.map((b, i) => (
            <Rect
              key={i}
              x={0}
              y={i * rowH + 3}
              width={Math.max(
                0,
                ((width - labelW - valueW - 4) * (Number.isFinite(b.value) ? b.value : 0)) / max,
              )}
              height={rowH - 6}
              fill={b.highlight ? ACCENT : "#8fb3a0"}
            />
          ))}
        </Svg>
        <View style={{ width: valueW }}>
          {bars.map((b, i) => (
            <Text key={i} style={{ height: rowH, paddingTop: 4, textAlign: "right" }}>
              {format(b.value)}
            </Text>
          ))}
        </View>
      </View>
    </View>
  );
}

function OptionDetail({ o, c, system }: { o: TReportOption; c: TReportContent; system: TSystem }) {
  const money = (v: number | null) => formatReportMoney(v, c.currency);
  const rate = (v: number | null) => formatReportRate(v, c.currency);
  return (
    <View>
      {/* An option's heading, machine and fitment move to the next page together, never apart. */}
      <View wrap={false}>
        <Text style={s.h2}>
          {o.label}
          {o.key === c.recommendedKey && c.options.length > 1 ? " (lowest cost per hour)" : ""}
        </Text>
        {o.description ? <Text style={[s.muted, { marginBottom: 4 }]}>{o.description}</Text> : null}
        <Text style={{ marginBottom: 4 }}>
          {o.machine.name} · {LAYOUT_NAMES[o.machine.layout] ?? o.machine.layout} · wheelbase{" "}
          {formatLength(system, o.machine.wheelbase)} · track{" "}
          {formatLength(system, o.machine.tracks.front)} front,{" "}
          {formatLength(system, o.machine.tracks.rear)} rear · drive {o.machine.drive}
        </Text>
        <Table
          widths={[12, 24, 16, 16, 16, 16]}
          head={["Axle", "Tyre", "Axle load", "Tread new", "Replace at", "Price each"]}
          rows={o.machine.fitment.map((f) => [
            f.axle === "front" ? "Front" : "Rear",
            f.designation,
            formatMass(system, f.load),
            formatDepth(system, f.treadDepthNew, 0),
            formatDepth(system, f.treadDepthReplace, 0),
            money(f.price),
          ])}
        />
      </View>
      <View style={{ height: 6 }} />
      <Table
        widths={[18, 20, 16, 16, 15, 15]}
        head={["Position", "Tyre", "Wear / 100 h", "Tyre life", "Replacement", "Cost per hour"]}
        rows={o.positions.map((p) => [
          `${POSITION_NAMES[p.position] ?? p.position}${p.wearsFirst ? " (first)" : ""}`,
          p.designation,
          formatDepth(system, p.wearPer100h.total),
          formatHours(p.hoursToReplacement),
          money(p.replacementCost),
          rate(p.costPerHour),
        ])}
      />
      <Text style={{ marginTop: 4, fontWeight: 700 }}>
        Tyre cost per operating hour: {rate(o.costPerHour)}
        {o.baseline
          ? ""
          : ` · one-off cost ${money(o.oneOffCost)} · saving ${rate(o.savingPerHour)} · payback ${
              o.paybackHours === null ? "never at this duty cycle" : formatHours(o.paybackHours)
            }`}
      </Text>
      {o.feasible === false ? (
        <Text style={[s.caution, { marginTop: 3, fontWeight: 700 }]}>
          Not workable as priced: it overloads a tyre or adds a turn the machine cannot make at this
          duty cycle.
        </Text>
      ) : null}
      {o.reasons?.map((r, i) => (
        <Text key={i} style={{ marginTop: 2 }}>
          • {r}
        </Text>
      ))}
      {o.warnings.map((w, i) => (
        <Text key={i} style={[s.caution, { marginTop: 3 }]}>
          {w}
        </Text>
      ))}
      {o.cautions?.map((x) => (
        <Text key={x.code} style={[s.caution, { marginTop: 3 }]}>
          Before making this change: {x.text}
        </Text>
      ))}
      {o.rotation.map((r, i) => (
        <Text key={i} style={s.muted}>
          Rotation: {r}
        </Text>
      ))}
    </View>
  );
}

/** The quote report as a PDF: same frozen content as the web page, in the reader's units. */
export function ReportDocument({
  content: c,
  reportId,
  version,
  supersededAt,
  logo,
  system,
}: {
  content: TReportContent;
  reportId: string;
  version: number;
  supersededAt: string | null;
  logo: Buffer | null;
  system: TSystem;
}) {
  const money = (v: number | null) => formatReportMoney(v, c.currency);
  const rate = (v: number | null) => formatReportRate(v, c.currency);
  const ref = `Report ${reportId.slice(0, 8).toUpperCase()} · version ${version}`;
  const turnRows = c.options[0]!.result.turns.slice(0, 40);
  const dc = c.dutyCycle;
  return (
    <Document
      title={`${c.title} (version ${version})`}
      author={c.dealership.name}
      creator="Treadcast"
    >
      <Page size="A4" style={s.page}>
        <View style={[s.row, { justifyContent: "space-between", marginBottom: 10 }]}>
          <View style={{ width: "60%" }}>
            <Text style={{ fontSize: 11, fontWeight: 700 }}>{c.dealership.name}</Text>
            {c.dealership.contactLine ? (
              <Text style={s.muted}>{c.dealership.contactLine}</Text>
            ) : null}
          </View>
          {logo ? (
            // react-pdf's Image has no alt; the dealership name is printed beside it.
            // eslint-disable-next-line jsx-a11y/alt-text
            <Image src={logo} style={{ maxWidth: 160, maxHeight: 60, objectFit: "contain" }} />
          ) : null}
        </View>
        {supersededAt ? (
          <Text style={s.superseded}>
            Superseded on {new Date(supersededAt).toUTCString().slice(5, 16)} by a newer version of
            this report.
          </Text>
        ) : null}
        <Text style={s.h1}>{c.title}</Text>
        <Text style={s.muted}>
          For {c.customer.name}
          {c.customer.contactName ? ` (${c.customer.contactName})` : ""} · issued{" "}
          {new Date(c.issuedAt).toUTCString().slice(5, 16)} by {c.issuedBy} · {ref}
        </Text>
        {c.customerNote ? <Text style={{ marginTop: 8 }}>{c.customerNote}</Text> : null}

        <Text style={s.h2}>Summary</Text>
        <BarsChart
          title={`Tyre cost per operating hour (${c.currency}/h)`}
          bars={c.options.map((o) => ({
            label: o.label,
            value: o.costPerHour,
            highlight: o.key === c.recommendedKey,
          }))}
          format={(v) => rate(v)}
        />
        {c.options.length > 1 ? (
          <Table
            widths={[28, 18, 18, 18, 18]}
            head={["Option", "Cost per hour", "One-off cost", "Saving per hour", "Payback"]}
            rows={c.options.map((o) => [
              o.label,
              rate(o.costPerHour),
              o.baseline ? "—" : money(o.oneOffCost),
              o.baseline ? "baseline" : rate(o.savingPerHour),
              o.baseline
                ? "—"
                : o.feasible === false
                  ? "not workable"
                  : o.paybackHours === null
                    ? "never"
                    : formatHours(o.paybackHours),
            ])}
          />
        ) : null}

        <Text style={s.h2}>Duty cycle: {dc.name}</Text>
        <Text>
          {dc.turnKinds} kinds of turn, {dc.turnsPerHour.toFixed(1)} turns per operating hour;{" "}
          {formatDistance(system, dc.straightDistancePerHour)} of straight travel per hour at{" "}
          {formatSpeed(system, dc.straightSpeed)}.
          {dc.surfaces.length
            ? ` Turns by surface: ${dc.surfaces.map((x) => `${x.surface} ${(x.share * 100).toFixed(0)} %`).join(", ")}.`
            : ""}
        </Text>
        <BarsChart
          title="Turns per operating hour by turn radius"
          bars={dc.byRadius.map((b) => ({ label: b.label, value: b.perHour }))}
          format={(v) => `${v.toFixed(1)} /h`}
        />

        {c.options.map((o) => (
          <OptionDetail key={o.key} o={o} c={c} system={system} />
        ))}

        {c.recommendations ? (
          <View>
            <Text style={s.h2}>Recommendations</Text>
            <Text>{c.recommendations}</Text>
          </View>
        ) : null}

        <Text style={s.h2}>Assumptions and their sources</Text>
        {c.assumptions.map((a, i) => (
          <View key={i} style={{ marginBottom: 3 }} wrap={false}>
            <Text>
              <Text style={{ fontWeight: 700 }}>{a.topic}: </Text>
              {a.text}
            </Text>
            <Text style={[s.muted, { fontStyle: "italic" }]}>Source: {a.source}</Text>
          </View>
        ))}
        <Text style={{ marginTop: 4 }}>Engine version {c.engineVersion}.</Text>

        <Text style={s.h2}>Safety cautions</Text>
        {c.cautions.map((x) => (
          <Text key={x.code} style={s.caution}>
            {x.text}
          </Text>
        ))}

        <Text style={s.h2} break>
          Annex: turns of the duty cycle ({c.options[0]!.label})
        </Text>
        <Text style={[s.muted, { marginBottom: 4 }]}>
          {turnRows.length < c.options[0]!.result.turns.length
            ? `First ${turnRows.length} of ${c.options[0]!.result.turns.length} kinds of turn. `
            : ""}
          Every wheel of every turn, for every option, is in the CSV annex downloaded with this
          report.
        </Text>
        <Table
          widths={[34, 12, 18, 18, 18]}
          head={["Turn", "Per hour", "Radius", "Turning diameter", "Energy per turn"]}
          rows={turnRows.map((t) => [
            t.label || `Turn ${t.index + 1}`,
            t.perHour.toFixed(1),
            formatLength(system, t.radius, 1),
            t.turningDiameter === null ? "—" : formatLength(system, t.turningDiameter, 1),
            t.feasible ? `${(t.energy / 1000).toFixed(2)} kJ` : "too tight",
          ])}
        />

        <View style={s.footer} fixed>
          <Text>
            {c.dealership.name} · {ref}
          </Text>
          <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
        </View>
      </Page>
    </Document>
  );
}
