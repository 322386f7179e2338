import { useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { moneyText, parseMoneyText } from '@/components/ui/decimal-text';
import { FieldCell, FieldRow } from '@/components/ui/field-row';
import { bindForm } from '@/components/ui/form/binding';
import { dateCodec, moneyCodec, textCodec } from '@/components/ui/form/codecs';
import { FormDate, FormMoney, FormText } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { FormFooter } from '@/components/ui/form-footer';
import { Heading, Text } from '@/components/ui/text';
import { palette, radii, spacing } from '@/constants/theme';
import { formatMoney } from '@/shared/money/format';
import { trySplitSale } from '@/shared/money/split';
import { type Money } from '@/shared/schemas/money';
import { type SaleInput, type SaleInputParsed, saleInputSchema } from '@/shared/schemas/sale';
import { type Terms } from '@/shared/schemas/terms';

import { SaleFigures, type Side } from './sale-figures';
import { dateProblem, type DateWindow, priceProblem } from './sale-rules';

type SaleValues = { soldOn: string; salePrice: string; discountReason: string };

/** What a sale form needs to know of the piece: its price, its terms and the days allowed. */
export type SalePiece = DateWindow & { title: string; listPrice: Money; terms: Terms };

/** The price typed, when it reads as an amount below the list price. */
function discountOf(text: string, listPrice: Money): Money | null {
  const read = parseMoneyText(text, listPrice.currency);
  if (read.kind !== 'ok' || read.value.amount >= listPrice.amount) return null;
  return { amount: listPrice.amount - read.value.amount, currency: listPrice.currency };
}

function bindingFor(piece: SalePiece) {
  // The shared request schema, with the piece's own rules the server applies too.
  const schema = saleInputSchema.superRefine((sale, ctx) => {
    const date = dateProblem(sale.soldOn, piece);
    if (date) ctx.addIssue({ code: 'custom', path: ['soldOn'], message: date });
    const price = priceProblem(sale.salePrice, piece.listPrice);
    if (price) ctx.addIssue({ code: 'custom', path: ['salePrice'], message: price });
  });
  return bindForm<SaleValues, SaleInputParsed>(schema, {
    soldOn: { read: dateCodec, blank: { required: 'Enter the day it sold.' } },
    salePrice: {
      read: moneyCodec(piece.listPrice.currency),
      blank: { required: 'Enter the price paid.' },
    },
    discountReason: {
      read: textCodec,
      when: (values) => discountOf(values.salePrice, piece.listPrice) !== null,
    },
  });
}

/** What the price typed would come to: the discount, then the split by the shared money rules. */
function Preview({
  piece,
  priceText,
  side,
  testID,
}: {
  piece: SalePiece;
  priceText: string;
  side: Side;
  testID: string;
}) {
  const read = parseMoneyText(priceText, piece.listPrice.currency);
  let body;
  if (read.kind !== 'ok') {
    body = <Text variant="small">Enter the price paid to see how it splits.</Text>;
  } else if (read.value.amount > piece.listPrice.amount) {
    body = <Text style={styles.problem}>{priceProblem(read.value, piece.listPrice)}</Text>;
  } else {
    const split = trySplitSale(piece.terms, piece.listPrice, read.value);
    const discount = piece.listPrice.amount - read.value.amount;
    body =
      split === null ? (
        <Text style={styles.problem}>
          At this price the commission would come to more than the sale brings in: check the price,
          or agree another discount rule with the maker.
        </Text>
      ) : (
        <>
          <Text testID={`${testID}-price`}>
            {discount > 0
              ? `${formatMoney(read.value)}: ${formatMoney({ amount: discount, currency: read.value.currency })} off the list price`
              : `${formatMoney(read.value)}, the list price`}
          </Text>
          <SaleFigures terms={piece.terms} split={split} side={side} testID={testID} />
        </>
      );
  }
  return (
    <View style={styles.preview} aria-live="polite">
      <Heading level={3}>At this price</Heading>
      {body}
      <Text variant="small">
        Worked out from the consignment’s terms, as the statement will. VAT figures are guidance.
      </Text>
    </View>
  );
}

/**
 * A piece sold: the day (today in the studio's time zone unless changed), the price paid (the
 * list price unless lower, then why), and before confirming, what that price leaves the venue
 * and the maker. The same form on the venue's side and the studio's.
 */
export function SaleForm({
  piece,
  side,
  testID,
  onSubmit,
  onCancel,
}: {
  piece: SalePiece;
  side: Side;
  testID: string;
  onSubmit: (sale: SaleInput) => Promise<void>;
  onCancel: () => void;
}) {
  const binding = bindingFor(piece);
  const { control, formState, submit } = useSchemaForm(binding, {
    soldOn: piece.today,
    salePrice: moneyText(piece.listPrice),
    discountReason: '',
  });
  const priceText = useWatch({ control, name: 'salePrice' });
  const discount = discountOf(priceText, piece.listPrice);
  return (
    <View style={styles.form} role="form" aria-label={`The sale of ${piece.title}`}>
      <FieldRow>
        <FieldCell basis={150}>
          <FormDate control={control} name="soldOn" testID={`${testID}-date`} label="Sold on" />
        </FieldCell>
        <FieldCell basis={150}>
          <FormMoney
            control={control}
            name="salePrice"
            testID={`${testID}-price`}
            label="Price paid"
            currency={piece.listPrice.currency}
          />
        </FieldCell>
      </FieldRow>
      <Text variant="small">{`List price ${formatMoney(piece.listPrice)}.`}</Text>
      {discount ? (
        <FormText
          control={control}
          name="discountReason"
          testID={`${testID}-reason`}
          label={`Why ${formatMoney(discount)} off? (optional)`}
          hint="The maker sees this with the sale."
        />
      ) : null}
      <Preview piece={piece} priceText={priceText} side={side} testID={`${testID}-preview`} />
      <FormFooter
        name={testID}
        errors={formState.errors}
        submitLabel="Confirm the sale"
        busyLabel="Recording the sale…"
        busy={formState.isSubmitting}
        onSubmit={submit(onSubmit)}
        stretch
        aside={<Button label="Never mind" variant="quiet" onPress={onCancel} />}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
  preview: {
    gap: spacing.sm,
    padding: spacing.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: palette.accent,
    backgroundColor: palette.accentSoft,
  },
  problem: { color: palette.danger },
});
