import { ErrorView } from '../../components/errors/route-error-boundary';

export function Component() {
  return (
    <ErrorView
      status={404}
      title="Not found"
      message="There is nothing at this address. It may have moved, or the link may be wrong."
    />
  );
}
