import { fireEvent, render, screen } from '@testing-library/react-native';

import { NetPreview } from '@/components/screens/terms-form/net-preview';
import { termsValues } from '@/components/screens/terms-form/terms-form-values';
import { defaultTerms } from '@/shared/schemas/terms';

const usual = termsValues(defaultTerms);

describe('NetPreview', () => {
  it('shows what the maker nets on £100 under the usual terms (40% shared, no VAT: £60)', () => {
    render(<NetPreview values={usual} />);

    expect(screen.getByTestId('net-preview-price')).toHaveTextContent('£100.00');
    expect(screen.getByTestId('net-preview-venue')).toHaveTextContent('£40.00');
    expect(screen.getByTestId('net-preview-share')).toHaveTextContent('£60.00');
  });

  it('changes as the commission changes', () => {
    const { rerender } = render(<NetPreview values={{ ...usual, commissionRate: '40' }} />);
    expect(screen.getByTestId('net-preview-share')).toHaveTextContent('£60.00');

    rerender(<NetPreview values={{ ...usual, commissionRate: '33.5' }} />);
    expect(screen.getByTestId('net-preview-share')).toHaveTextContent('£66.50');
    expect(screen.getByTestId('net-preview-venue')).toHaveTextContent('£33.50');
  });

  it('adds VAT on top of the commission when the terms say so (40% of £100 plus 20%: £48)', () => {
    render(<NetPreview values={{ ...usual, commissionVat: 'added' }} />);

    expect(screen.getByTestId('net-preview-venue')).toHaveTextContent('£48.00');
    expect(screen.getByTestId('net-preview-vat')).toHaveTextContent('£8.00');
    expect(screen.getByTestId('net-preview-share')).toHaveTextContent('£52.00');
  });

  it('follows the sample price the maker types', () => {
    render(<NetPreview values={usual} />);

    fireEvent.changeText(screen.getByTestId('net-preview-sample'), '245.50');
    expect(screen.getByTestId('net-preview-share')).toHaveTextContent('£147.30');
  });

  it('waits for a commission it can read', () => {
    render(<NetPreview values={{ ...usual, commissionRate: 'forty' }} />);

    expect(screen.queryByTestId('net-preview-share')).toBeNull();
    expect(screen.getByText('Complete the rates above to see what you would net.')).toBeTruthy();
  });
});
