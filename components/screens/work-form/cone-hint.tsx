import { Text } from '@/components/ui/text';
import { nearestCone } from '@/shared/firing/cones';

/** The chart column used: most firings end on a slow final climb. */
const heatingRate = 60;

/** The nearest listed Orton cone for a firing temperature, worked out as the maker types. */
export function ConeHint({ temperatureText }: { temperatureText: string }) {
  const temperature = Number(temperatureText.trim());
  const readable = temperatureText.trim() !== '' && Number.isInteger(temperature);
  if (!readable || temperature < 500 || temperature > 1600) {
    return (
      <Text variant="small" testID="work-cone">
        Enter the top temperature to see the nearest Orton cone.
      </Text>
    );
  }
  const cone = nearestCone(temperature, heatingRate);
  const off =
    cone.differenceC === 0
      ? 'exactly'
      : `${Math.abs(cone.differenceC)} °C ${cone.differenceC > 0 ? 'above' : 'below'}`;
  return (
    <Text variant="small" testID="work-cone" aria-live="polite">
      {`Nearest cone: ${cone.cone} (${cone.temperatureC} °C at ${cone.heatingRate} °C an hour; ${off}). Orton self-supporting cone chart.`}
    </Text>
  );
}
