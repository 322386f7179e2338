import { fireEvent, render, screen } from '@testing-library/react-native';
import { useState } from 'react';

import { parseMoneyText, parsePercentText, percentText } from '@/components/ui/decimal-text';
import { MoneyField } from '@/components/ui/money-field';

describe('parseMoneyText', () => {
  it.each([
    ['45', 4500],
    ['45.5', 4550],
    ['45.50', 4550],
    ['£1,250.00', 125000],
    ['  12.3 ', 1230],
    ['0', 0],
  ])('reads %p as %p pence', (text, amount) => {
    expect(parseMoneyText(text, 'GBP')).toEqual({ kind: 'ok', value: { amount, currency: 'GBP' } });
  });

  it('keeps every penny where floating point would lose one (0.29 × 100 is 28.999… in binary)', () => {
    expect(0.29 * 100).not.toBe(29);
    expect(parseMoneyText('0.29', 'GBP')).toEqual({
      kind: 'ok',
      value: { amount: 29, currency: 'GBP' },
    });
    expect(parseMoneyText('1234567.89', 'GBP')).toEqual({
      kind: 'ok',
      value: { amount: 123456789, currency: 'GBP' },
    });
  });

  it('follows the currency’s minor unit (ISO 4217: JPY has none, BHD three)', () => {
    expect(parseMoneyText('1234', 'JPY')).toEqual({
      kind: 'ok',
      value: { amount: 1234, currency: 'JPY' },
    });
    expect(parseMoneyText('1.234', 'BHD')).toEqual({
      kind: 'ok',
      value: { amount: 1234, currency: 'BHD' },
    });
    expect(parseMoneyText('12.5', 'JPY').kind).toBe('invalid');
  });

  it('says in plain words what is wrong', () => {
    expect(parseMoneyText('', 'GBP')).toEqual({ kind: 'empty' });
    expect(parseMoneyText('45.555', 'GBP')).toEqual({
      kind: 'invalid',
      message: 'Enter at most 2 decimal places (pounds and pence).',
    });
    expect(parseMoneyText('12,50', 'GBP')).toEqual({
      kind: 'invalid',
      message: 'Enter the amount as a number, such as 45 or 45.50.',
    });
    expect(parseMoneyText('forty', 'GBP').kind).toBe('invalid');
    expect(parseMoneyText('-3', 'GBP')).toEqual({
      kind: 'invalid',
      message: 'A price cannot be below zero.',
    });
  });
});

describe('parsePercentText', () => {
  it('turns percentages into basis points exactly', () => {
    expect(parsePercentText('40')).toEqual({ kind: 'ok', value: 4000 });
    expect(parsePercentText('17.5')).toEqual({ kind: 'ok', value: 1750 });
    expect(parsePercentText('12.25%')).toEqual({ kind: 'ok', value: 1225 });
    expect(parsePercentText('100.01').kind).toBe('invalid');
    expect(parsePercentText('12.345').kind).toBe('invalid');
  });

  it('writes basis points back as the percentage a person types', () => {
    expect(percentText(4000)).toBe('40');
    expect(percentText(1750)).toBe('17.5');
    expect(percentText(1225)).toBe('12.25');
    expect(percentText(5)).toBe('0.05');
  });
});

function Harness() {
  const [text, setText] = useState('');
  const parsed = parseMoneyText(text, 'GBP');
  return (
    <MoneyField
      testID="price"
      label="Retail price"
      currency="GBP"
      value={text}
      onChangeText={setText}
      error={parsed.kind === 'invalid' ? parsed.message : undefined}
    />
  );
}

describe('MoneyField', () => {
  it('shows the currency symbol and keeps the text as typed, with the problem beside it', () => {
    render(<Harness />);
    // The symbol is drawn for the eye; the label says what the field is.
    expect(screen.getByText('£', { includeHiddenElements: true })).toBeTruthy();

    fireEvent.changeText(screen.getByTestId('price'), '45.555');
    expect(screen.getByTestId('price')).toHaveDisplayValue('45.555');
    expect(screen.getByTestId('price-error')).toHaveTextContent(
      'Enter at most 2 decimal places (pounds and pence).',
    );

    fireEvent.changeText(screen.getByTestId('price'), '45.55');
    expect(screen.queryByTestId('price-error')).toBeNull();
  });
});
