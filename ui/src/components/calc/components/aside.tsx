import { memo, type ReactNode } from 'react';

/**
 * What a page puts beside a field, step or check (a comment marker). Memoised on the id and the
 * page's renderer, so a row whose numbers change on a key press does not render its marker (a
 * tooltip and a popover) again.
 */
export const Aside = memo(function Aside({
  id,
  render,
}: {
  id: string;
  render: (id: string) => ReactNode;
}) {
  return render(id);
});
