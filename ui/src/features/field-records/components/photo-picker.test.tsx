import { describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { useState } from 'react';
import { MAX_ATTACHMENT_BYTES } from '@holdfast/shared';
import { renderWithProviders } from '../../../testing/render';
import type { OutboxPhoto } from '../offline/outbox-store';
import { PhotoPicker } from './photo-picker';

function Harness(props: { online?: boolean; kept?: OutboxPhoto[] }) {
  const [photos, setPhotos] = useState<OutboxPhoto[]>([]);
  const [notes, setNotes] = useState('Shoe B drags');
  return (
    <>
      <label>
        Findings
        <textarea value={notes} onChange={(e) => setNotes(e.currentTarget.value)} />
      </label>
      <PhotoPicker
        photos={[...(props.kept ?? []), ...photos]}
        unsaved={new Set(photos.map((p) => p.id))}
        onAdd={(p) => setPhotos((all) => [...all, ...p])}
        onRemove={(id) => setPhotos((all) => all.filter((p) => p.id !== id))}
        online={props.online ?? true}
      />
    </>
  );
}

function pick(...files: File[]) {
  fireEvent.change(screen.getByLabelText('Photos'), { target: { files } });
}

const jpeg = (name: string, bytes = 2048) =>
  new File([new Uint8Array(bytes)], name, { type: 'image/jpeg' });

describe('PhotoPicker', () => {
  it('takes PNG and JPEG photos, listing each with its name and size', async () => {
    renderWithProviders(<Harness />);
    const input = screen.getByLabelText('Photos');
    expect(input).toHaveAttribute('type', 'file');
    expect(input).toHaveAttribute('accept', 'image/png,image/jpeg');
    pick(
      jpeg('shoe-a.jpg', 340 * 1024),
      new File([new Uint8Array(812)], 'gauge.png', { type: 'image/png' }),
    );
    const a = await screen.findByText('shoe-a.jpg');
    expect(a.closest('li')).toHaveTextContent('340 kB');
    expect(a.closest('li')).toHaveTextContent('On this device');
    expect(screen.getByText('gauge.png').closest('li')).toHaveTextContent('812 B');
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('refuses a file the server would refuse, by name and reason, and keeps the rest', async () => {
    const { user } = renderWithProviders(<Harness />);
    pick(jpeg('first.jpg'));
    await screen.findByText('first.jpg');
    const big = jpeg('huge.jpg', 1);
    Object.defineProperty(big, 'size', { value: MAX_ATTACHMENT_BYTES + 1 });
    pick(new File(['GIF89a'], 'sketch.gif', { type: 'image/gif' }), big, jpeg('second.jpg'));
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('sketch.gif was not added: Photos are PNG or JPEG.');
    expect(alert).toHaveTextContent(
      'huge.jpg was not added: The file is too large (limit 25 MB per file).',
    );
    // The photos already picked, the good one of this pick and the other entries all stay.
    expect(await screen.findByText('second.jpg')).toBeInTheDocument();
    expect(screen.getByText('first.jpg')).toBeInTheDocument();
    expect(screen.queryByText('sketch.gif')).toBeNull();
    expect(screen.getByLabelText('Findings')).toHaveValue('Shoe B drags');
    await user.click(screen.getByRole('button', { name: 'Take off first.jpg' }));
    expect(screen.queryByText('first.jpg')).toBeNull();
  });

  it('says offline that photos stay on the device, and shows a server refusal per photo', () => {
    const kept: OutboxPhoto = {
      id: 'k1',
      name: 'lining.jpg',
      type: 'image/jpeg',
      size: 4096,
      bytes: new ArrayBuffer(0),
      state: 'refused',
      message: 'The record is signed; photos go with a draft.',
    };
    renderWithProviders(<Harness online={false} kept={[kept]} />);
    expect(screen.getByText(/No connection: photos stay on this device/)).toBeInTheDocument();
    const row = screen.getByText('lining.jpg').closest('li')!;
    expect(within(row).getByText('Refused')).toBeInTheDocument();
    expect(row).toHaveTextContent('The record is signed; photos go with a draft.');
    // Kept photos belong to the outbox and are not taken off here.
    expect(within(row).queryByRole('button')).toBeNull();
  });

  it('refuses a photo beyond the 20 a record may hold', async () => {
    const onAdd = vi.fn();
    const kept = Array.from({ length: 20 }, (_, i) => ({
      id: `p${i}`,
      name: `p${i}.jpg`,
      type: 'image/jpeg',
      size: 10,
      bytes: new ArrayBuffer(0),
      state: 'sent' as const,
    }));
    renderWithProviders(
      <PhotoPicker photos={kept} unsaved={new Set()} onAdd={onAdd} onRemove={() => {}} online />,
    );
    pick(jpeg('one-more.jpg'));
    await waitFor(() =>
      expect(screen.getByRole('alert')).toHaveTextContent(
        'one-more.jpg was not added: A record holds at most 20 photos.',
      ),
    );
    expect(onAdd).not.toHaveBeenCalled();
  });
});
