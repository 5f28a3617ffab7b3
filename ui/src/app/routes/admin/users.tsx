import { Page } from '../../../components/layouts/page';
import { PlaceholderPanel } from '../../../components/placeholder-panel';

export function Component() {
  return (
    <Page title="Users" description="Who can sign in, and with which role.">
      <PlaceholderPanel />
    </Page>
  );
}
