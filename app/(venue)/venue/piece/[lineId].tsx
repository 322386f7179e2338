import { useLocalSearchParams } from 'expo-router';

import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';
import { VenuePieceScreen } from '@/components/screens/venue-piece/venue-piece-screen';
import { PageTitle } from '@/components/ui/page-title';

/** Where a shelf label's QR code leads; `?sell=1` (the counter list's "Sold") opens the sale. */
export default function VenuePieceRoute() {
  const { lineId, sell } = useLocalSearchParams<{ lineId: string; sell?: string }>();
  const id = Number(lineId);
  if (!Number.isInteger(id) || id <= 0) return <NotFoundScreen />;
  return (
    <>
      <PageTitle title="Piece · Saggar" />
      <VenuePieceScreen lineId={id} sell={sell === '1'} />
    </>
  );
}
