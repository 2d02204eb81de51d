import "server-only";
import { Document, Image, Page, StyleSheet, Text, View } from "@react-pdf/renderer";
import { PDF_COLOURS, PDF_FONTS } from "@/server/pdf/fonts";
import { renderPdf } from "@/server/pdf/render";
import type { RecordCylinder, RecordView } from "@/shared/records/view";
import { dateTimeText, knownTimeZone } from "@/shared/time";

// The machining record as a PDF: the same RecordView the page shows. Inch records go on US Letter,
// metric ones on A4 (both fit: the layout is narrower than Letter and shorter than A4's margins allow).
const { ink: INK, soft: SOFT, rule: RULE, steel: STEEL } = PDF_COLOURS;

const s = StyleSheet.create({
  page: { fontFamily: PDF_FONTS.text, fontSize: 9, color: INK, padding: 36, paddingBottom: 48 },
  header: { flexDirection: "row", justifyContent: "space-between", borderBottomWidth: 1.5, borderBottomColor: STEEL, paddingBottom: 8, marginBottom: 10 },
  shopName: { fontSize: 14, fontWeight: 700 },
  soft: { color: SOFT },
  title: { fontSize: 13, fontWeight: 700, color: STEEL, textAlign: "right" },
  right: { textAlign: "right" },
  facts: { flexDirection: "row", flexWrap: "wrap", marginBottom: 10 },
  fact: { width: "33.3%", paddingVertical: 2, paddingRight: 6 },
  label: { fontSize: 7.5, color: SOFT, textTransform: "uppercase" },
  value: { fontSize: 9.5, fontWeight: 600 },
  num: { fontFamily: PDF_FONTS.figures },
  grid: { flexDirection: "row", flexWrap: "wrap", justifyContent: "space-between" },
  cylinder: { width: "49%", borderWidth: 1, borderColor: RULE, borderRadius: 3, padding: 6, marginBottom: 8 },
  cylTitle: { fontSize: 10.5, fontWeight: 700, marginBottom: 2 },
  row: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 1.5 },
  cellName: { width: "34%" },
  cell: { width: "33%", textAlign: "right", fontFamily: PDF_FONTS.figures },
  line: { flexDirection: "row", justifyContent: "space-between", paddingVertical: 1 },
  section: { marginTop: 6 },
  footer: { position: "absolute", bottom: 20, left: 36, right: 36, flexDirection: "row", justifyContent: "space-between", fontSize: 7.5, color: SOFT },
});


function Fact({ label, value, figure = false }: { label: string; value: string; figure?: boolean }) {
  return (
    <View style={s.fact}>
      <Text style={s.label}>{label}</Text>
      <Text style={figure ? [s.value, s.num] : s.value}>{value}</Text>
    </View>
  );
}

function Line({ label, value, words = false }: { label: string; value: string; words?: boolean }) {
  return (
    <View style={s.line}>
      <Text style={s.soft}>{label}</Text>
      <Text style={words ? undefined : s.num}>{value}</Text>
    </View>
  );
}

function CylinderBlock({ c, zone }: { c: RecordCylinder; zone: string }) {
  return (
    <View style={s.cylinder} wrap={false}>
      <Text style={s.cylTitle}>Cylinder {c.number}</Text>
      <Text style={s.soft}>
        Piston {c.piston.label}: <Text style={s.num}>Ø {c.piston.diameter.text}</Text>
        {c.piston.sizingHeight ? <Text> at <Text style={s.num}>{c.piston.sizingHeight.text}</Text> from the crown</Text> : null}
      </Text>
      <View style={[s.row, s.section]}>
        <Text style={[s.cellName, s.label]}>Finished Ø, 20 °C</Text>
        <Text style={[s.cell, s.label]}>A</Text>
        <Text style={[s.cell, s.label]}>B</Text>
      </View>
      {c.levels.map((l) => (
        <View style={s.row} key={l.name}>
          <Text style={s.cellName}>{l.name}</Text>
          <Text style={s.cell}>{l.a.text}</Text>
          <Text style={s.cell}>{l.b.text}</Text>
        </View>
      ))}
      <View style={s.section}>
        <Line label="Clearance to piston" value={`${c.clearance.min.text} – ${c.clearance.max.text}`} />
        <Line label="Taper" value={c.taper.text} />
        <Line label="Out-of-round" value={c.outOfRound.text} />
        {c.finish.length > 0 ? <Line label="Finish" value={c.finish.map((f) => `${f.name} ${f.text}`).join("  ")} /> : null}
        {c.stones.map((st, i) => <Line key={i} label={`${st.stage} stone`} value={`${st.code} · ${st.grit}`} />)}
        <Line label="Inspected" value={`${c.inspectedBy}, ${dateTimeText(c.inspectedAt, zone)}`} words />
      </View>
    </View>
  );
}

export function RecordDocument({ record, version, logo }: { record: RecordView; version: { number: number; replaces: number | null } | null; logo: Buffer | null }) {
  const j = record.job;
  const zone = knownTimeZone(record.shop.timeZone);
  return (
    <Document title={`Machining record, job #${j.number}`} author={record.shop.name} creator="Borewise" producer="Borewise">
      <Page size={record.unitSystem === "inch" ? "LETTER" : "A4"} style={s.page}>
        <View style={s.header} fixed>
          <View style={{ flexDirection: "row", gap: 8 }}>
            {/* eslint-disable-next-line jsx-a11y/alt-text -- a PDF image has no alt attribute; the shop name beside it says the same */}
            {logo ? <Image src={logo} style={{ width: 48, height: 48, objectFit: "contain" }} /> : null}
            <View>
              <Text style={s.shopName}>{record.shop.name}</Text>
              {record.shop.address ? <Text style={s.soft}>{record.shop.address}</Text> : null}
              {record.shop.contact ? <Text style={s.soft}>{record.shop.contact}</Text> : null}
            </View>
          </View>
          <View>
            <Text style={s.title}>Machining record</Text>
            <Text style={s.right}>Job #{j.number}{version ? `, version ${version.number}` : ""}</Text>
            {version?.replaces ? <Text style={[s.right, s.soft]}>Replaces version {version.replaces}</Text> : null}
            <Text style={[s.right, s.soft]}>{dateTimeText(record.madeAt, zone)}</Text>
          </View>
        </View>
        <View style={s.facts}>
          <Fact label="Customer" value={j.customer} />
          <Fact label="Engine" value={j.engineDescription} />
          <Fact label="Bore material" value={j.material} />
          <Fact label="Standard bore" value={`Ø ${j.standardBore.text}`} figure />
          <Fact label="Oversize" value={j.oversize.text} figure />
          <Fact label="Torque plate" value={j.torquePlate ? "used" : "not used"} />
          <Fact label="Inspected by" value={record.inspection.by} />
          <Fact label="Final inspection" value={dateTimeText(record.inspection.at, zone)} />
          <Fact label="Units" value={`${record.units.size}; clearance and geometry in ${record.units.small}`} />
        </View>
        <View style={s.grid}>
          {record.cylinders.map((c) => <CylinderBlock c={c} key={c.number} zone={zone} />)}
        </View>
        {j.notes ? (
          <View style={s.section} wrap={false}>
            <Text style={s.label}>Notes</Text>
            <Text>{j.notes}</Text>
          </View>
        ) : null}
        <View style={s.section} wrap={false}>
          <Text style={s.label}>Remarks</Text>
          <Text>{record.remarks}</Text>
        </View>
        <View style={s.footer} fixed>
          <Text>{record.shop.name} · job #{j.number}</Text>
          <Text render={({ pageNumber, totalPages }) => `page ${pageNumber} of ${totalPages}`} />
        </View>
      </Page>
    </Document>
  );
}

export function renderRecordPdf(record: RecordView, version: { number: number; replaces: number | null } | null, logo: Buffer | null = null): Promise<Buffer> {
  return renderPdf(<RecordDocument record={record} version={version} logo={logo} />);
}
