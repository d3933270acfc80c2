/**
 * Collects de-duplicated warnings while a chart spec is built; they go into the spec's metadata
 * (`usermeta.isochor.warnings`). Internal to the chart builders.
 */
export class WarningList {
  private readonly seen = new Set<string>();
  add(message: string): void {
    this.seen.add(message);
  }
  list(): string[] {
    return [...this.seen];
  }
}
