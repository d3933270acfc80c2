/**
 * Required fields of nbformat 4, for structural checks of executed notebooks.
 * Source: the "required" arrays of nbformat.v4.5.schema.json in nbformat 5.5.0 (Debian package
 * python3-nbformat, /usr/lib/python3/dist-packages/nbformat/v4/), read when this file was written.
 */
export const NOTEBOOK_REQUIRED = ["metadata", "nbformat_minor", "nbformat", "cells"];
export const CELL_REQUIRED: Record<string, string[]> = {
  raw: ["id", "cell_type", "metadata", "source"],
  markdown: ["id", "cell_type", "metadata", "source"],
  code: ["id", "cell_type", "metadata", "source", "outputs", "execution_count"],
};
/** Each output type's required fields; the schema also forbids any other field (additionalProperties: false). */
export const OUTPUT_FIELDS: Record<string, string[]> = {
  execute_result: ["output_type", "data", "metadata", "execution_count"],
  display_data: ["output_type", "data", "metadata"],
  stream: ["output_type", "name", "text"],
  error: ["output_type", "ename", "evalue", "traceback"],
};

/** Lists every structural problem of a parsed nbformat 4.5 notebook (empty when none). */
export function nbformat4Problems(nb: Record<string, unknown>): string[] {
  const problems: string[] = [];
  for (const key of NOTEBOOK_REQUIRED) if (!(key in nb)) problems.push(`notebook lacks ${key}`);
  if (nb.nbformat !== 4) problems.push(`nbformat is ${String(nb.nbformat)}`);
  const cells = (nb.cells ?? []) as Array<Record<string, unknown>>;
  cells.forEach((cell, i) => {
    const required = CELL_REQUIRED[String(cell.cell_type)];
    if (!required)
      return void problems.push(`cell ${i + 1}: unknown cell_type ${String(cell.cell_type)}`);
    for (const key of required) if (!(key in cell)) problems.push(`cell ${i + 1} lacks ${key}`);
    if (typeof cell.id === "string" && !/^[a-zA-Z0-9-_]{1,64}$/.test(cell.id)) {
      problems.push(`cell ${i + 1}: id ${cell.id} does not match the schema pattern`);
    }
    if (cell.cell_type !== "code") return;
    const count = cell.execution_count;
    if (!(count === null || (Number.isInteger(count) && (count as number) >= 0))) {
      problems.push(`cell ${i + 1}: execution_count ${String(count)}`);
    }
    ((cell.outputs ?? []) as Array<Record<string, unknown>>).forEach((output, j) => {
      const fields = OUTPUT_FIELDS[String(output.output_type)];
      if (!fields)
        return void problems.push(
          `cell ${i + 1} output ${j + 1}: output_type ${String(output.output_type)}`,
        );
      const keys = Object.keys(output).sort();
      if (JSON.stringify(keys) !== JSON.stringify([...fields].sort())) {
        problems.push(
          `cell ${i + 1} output ${j + 1} has fields ${keys.join(",")}, expected ${fields.join(",")}`,
        );
      }
      if (output.output_type === "stream" && !["stdout", "stderr"].includes(String(output.name))) {
        problems.push(`cell ${i + 1} output ${j + 1}: stream name ${String(output.name)}`);
      }
    });
  });
  return problems;
}
