/**
 * Rendered PDFs kept for repeat downloads, least recently used first out, bounded by their total
 * size. Keys name everything the bytes depend on, so an entry is never stale, only evicted.
 */
export class PdfCache {
  private readonly entries = new Map<string, Buffer>();
  private bytes = 0;

  constructor(private readonly maxBytes: number) {}

  get(key: string): Buffer | undefined {
    const hit = this.entries.get(key);
    if (hit) {
      // Map order is insertion order: re-inserting marks the entry as the most recently used.
      this.entries.delete(key);
      this.entries.set(key, hit);
    }
    return hit;
  }

  set(key: string, pdf: Buffer): void {
    if (pdf.length > this.maxBytes) return;
    const old = this.entries.get(key);
    if (old) {
      this.entries.delete(key);
      this.bytes -= old.length;
    }
    while (this.bytes + pdf.length > this.maxBytes) {
      const [oldestKey, oldest] = this.entries.entries().next().value as [string, Buffer];
      this.entries.delete(oldestKey);
      this.bytes -= oldest.length;
    }
    this.entries.set(key, pdf);
    this.bytes += pdf.length;
  }

  get size(): { entries: number; bytes: number } {
    return { entries: this.entries.size, bytes: this.bytes };
  }
}
