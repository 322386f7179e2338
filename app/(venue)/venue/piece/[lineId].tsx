import { useLocalSearchParams } from 'expo-router';

import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';
import { VenuePieceScreen } from '@/components/screens/venue-piece/venue-piece-screen';
import { PageTitle } from '@/components/ui/page-title';

/** Where a shelf label's QR code leads. */
export default function VenuePieceRoute() {
  const { lineId } = useLocalSearchParams<{ lineId: string }>();
  const id = Number(lineId);
  if (!Number.isInteger(id) || id <= 0) return <NotFoundScreen />;
  return (
    <>
      <PageTitle title="Piece · Saggar" />
      <VenuePieceScreen lineId={id} />
    </>
  );
}
