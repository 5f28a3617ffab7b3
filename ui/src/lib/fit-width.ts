/**
 * A width for a select box that shows its longest choice whole: the label's characters in `ch`
 * (a digit's width, wider than most letters of the UI font, so it errs on the roomy side) plus the
 * box's padding and its chevron or clear button. Never below `min` px, never wider than its row.
 */
export function fitWidth(labels: readonly string[], min = 0): string {
  return `min(100%, ${fitCellWidth(labels, min)})`;
}

/**
 * The same width as a floor for a table cell that holds such a box: in a table, "100 %" is the
 * column's share, which can be narrower than the box needs, so the cell must ask for the room.
 */
export function fitCellWidth(labels: readonly string[], min = 0): string {
  const longest = labels.reduce((n, l) => Math.max(n, l.length), 0);
  return `max(${min}px, calc(${longest}ch + 3.5rem))`;
}
