import { act, fireEvent, render, screen } from '@testing-library/react-native';
import { Pressable, Text } from 'react-native';

import { type Toast, ToastProvider, useToast } from '@/components/ui/toast';

function Trigger({ toast, label }: { toast: Toast; label: string }) {
  const show = useToast();
  return (
    <Pressable testID={label} onPress={() => show(toast)}>
      <Text>{label}</Text>
    </Pressable>
  );
}

describe('ToastProvider', () => {
  beforeEach(() => jest.useFakeTimers());
  afterEach(() => jest.useRealTimers());

  it('confirms, offers Undo once, and goes when Undo is pressed', () => {
    const undo = jest.fn();
    render(
      <ToastProvider>
        <Trigger
          label="archive"
          toast={{ message: 'Archived ‘Tall jug’.', action: { label: 'Undo', onPress: undo } }}
        />
      </ToastProvider>,
    );
    expect(screen.queryByTestId('toast')).toBeNull();

    fireEvent.press(screen.getByTestId('archive'));
    expect(screen.getByTestId('toast-message')).toHaveTextContent('Archived ‘Tall jug’.');
    fireEvent.press(screen.getByTestId('toast-action'));

    expect(undo).toHaveBeenCalledTimes(1);
    expect(screen.queryByTestId('toast')).toBeNull();
  });

  it('lets a newer message replace the one on screen, and each leave after its time', () => {
    render(
      <ToastProvider>
        <Trigger label="first" toast={{ message: 'Saved.' }} />
        <Trigger
          label="second"
          toast={{ message: 'Archived.', action: { label: 'Undo', onPress: jest.fn() } }}
        />
      </ToastProvider>,
    );
    fireEvent.press(screen.getByTestId('first'));
    act(() => jest.advanceTimersByTime(4_000));
    fireEvent.press(screen.getByTestId('second'));
    expect(screen.getByTestId('toast-message')).toHaveTextContent('Archived.');

    // The first one's time runs out without taking the second with it.
    act(() => jest.advanceTimersByTime(2_000));
    expect(screen.getByTestId('toast-message')).toHaveTextContent('Archived.');
    // A message with an action stays long enough to reach it.
    act(() => jest.advanceTimersByTime(7_000));
    expect(screen.getByTestId('toast')).toBeTruthy();
    act(() => jest.advanceTimersByTime(1_000));
    expect(screen.queryByTestId('toast')).toBeNull();
  });

  it('can be dismissed at once', () => {
    render(
      <ToastProvider>
        <Trigger label="save" toast={{ message: 'Saved.' }} />
      </ToastProvider>,
    );
    fireEvent.press(screen.getByTestId('save'));
    fireEvent.press(screen.getByText('Dismiss'));
    expect(screen.queryByTestId('toast')).toBeNull();
  });
});
