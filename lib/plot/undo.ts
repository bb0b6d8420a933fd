// The session's undo list: each entry knows how to put things back. Bounded, newest last.
export type UndoEntry = { label: string; undo: () => Promise<void> };

export class UndoStack {
  private entries: UndoEntry[] = [];
  constructor(private readonly limit = 30) {}

  push(entry: UndoEntry) {
    this.entries.push(entry);
    if (this.entries.length > this.limit) this.entries.shift();
  }

  pop(): UndoEntry | undefined {
    return this.entries.pop();
  }

  peek(): UndoEntry | undefined {
    return this.entries[this.entries.length - 1];
  }

  get size() {
    return this.entries.length;
  }
}
