/**
 * Labels beside points (the critical point, the states of a process path) that move around their
 * point (internal). Vega-Lite places a text mark at one fixed offset for every row, so each label
 * family is written as one text layer per candidate offset ("slot"), each layer keeping the rows
 * whose `labelSlot` equals its own; `placeGuideLabels` (labelPlacement.ts) then sets `labelSlot`
 * per row: the first slot, in the order below, whose text box stays inside the plot and touches
 * no other label or marker and the fewest drawn lines. Without placement every row keeps slot 0,
 * the usual place above right of the point.
 */

/** Candidate offsets around the point, px (baseline "middle"), in order of preference. */
export const POINT_LABEL_SLOTS: readonly {
  align: "left" | "right" | "center";
  dx: number;
  dy: number;
}[] = [
  { align: "left", dx: 8, dy: -9 }, // above right
  { align: "left", dx: 8, dy: 10 }, // below right
  { align: "right", dx: -8, dy: -9 }, // above left
  { align: "right", dx: -8, dy: 10 }, // below left
  { align: "left", dx: 10, dy: 0 }, // right
  { align: "right", dx: -10, dy: 0 }, // left
  { align: "center", dx: 0, dy: -14 }, // above
  { align: "center", dx: 0, dy: 15 }, // below
];

/**
 * The text layers of a family of point labels: rows at the points (x, y) with their text in
 * `textField`; `mark` the common text style (font, colour). Each row gets `labelRole:
 * "point-label"`, `labelSlot: 0` and the family's `labelGroup` id.
 */
export function pointLabelLayers(
  rows: readonly Record<string, unknown>[],
  encoding: Record<string, unknown>,
  textField: string,
  mark: Record<string, unknown>,
  group: string,
  slots: readonly {
    align: "left" | "right" | "center";
    dx: number;
    dy: number;
  }[] = POINT_LABEL_SLOTS,
): Record<string, unknown>[] {
  const values = rows.map((r) => ({
    ...r,
    labelRole: "point-label",
    labelGroup: group,
    labelSlot: 0,
  }));
  return slots.map((slot, k) => ({
    data: { values: values.map((r) => ({ ...r })) },
    transform: [{ filter: { field: "labelSlot", equal: k } }],
    mark: { type: "text", baseline: "middle", ...mark, ...slot },
    encoding: { ...encoding, text: { field: textField, type: "nominal" } },
  }));
}
