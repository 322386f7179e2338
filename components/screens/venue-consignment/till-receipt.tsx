import { useState } from 'react';
import { useWatch } from 'react-hook-form';
import { Pressable, StyleSheet, View } from 'react-native';
import { z } from 'zod';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { moneyText, parseMoneyText } from '@/components/ui/decimal-text';
import { bindForm, type FieldBindings, type FormBinding } from '@/components/ui/form/binding';
import { dateCodec, moneyCodec, textCodec } from '@/components/ui/form/codecs';
import { FormDate, FormMoney, FormText } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { SquareImage } from '@/components/ui/square-image';
import { StateGlyph } from '@/components/ui/state-mark';
import { Heading, Text } from '@/components/ui/text';
import { focusRing, useFocusRing } from '@/components/ui/use-focus-ring';
import { palette, radii, spacing, touchTarget } from '@/constants/theme';
import { useSaleBatchMutation } from '@/hooks/queries/sales';
import { formatMoney } from '@/shared/money/format';
import { type Consignment, type ConsignmentLine } from '@/shared/schemas/consignment';
import { type SaleBatchParsed, saleBatchSchema } from '@/shared/schemas/sale';

import { dateProblem, type DateWindow, priceProblem } from '../sale/sale-rules';

/** `soldOn`, then `price-<lineId>` and `reason-<lineId>` for every piece out. */
type ReceiptValues = Record<string, string>;

const priceField = (line: ConsignmentLine) => `price-${line.id}`;
const reasonField = (line: ConsignmentLine) => `reason-${line.id}`;

function below(text: string | undefined, line: ConsignmentLine): boolean {
  const read = parseMoneyText(text ?? '', line.listPrice.currency);
  return read.kind === 'ok' && read.value.amount < line.listPrice.amount;
}

/**
 * The request a receipt makes: one date for all, each ticked piece's price and reason. The
 * binding writes `soldOn` once and each piece under `sales.<i>`; the schema copies the date into
 * each sale, and the server's `sales.<i>.soldOn` lands back on the one date field.
 */
function receiptBinding(
  ticked: readonly ConsignmentLine[],
  window: DateWindow,
): FormBinding<ReceiptValues, SaleBatchParsed> {
  const schema = z.preprocess(
    (raw) => {
      const body = raw as { soldOn?: unknown; sales?: Record<string, object> };
      return {
        sales: ticked.map((line, i) => ({
          lineId: line.id,
          soldOn: body.soldOn,
          ...body.sales?.[String(i)],
        })),
      };
    },
    saleBatchSchema.superRefine(({ sales }, ctx) => {
      const date = sales[0] ? dateProblem(sales[0].soldOn, window) : null;
      if (date) ctx.addIssue({ code: 'custom', path: ['soldOn'], message: date });
      sales.forEach((sale, i) => {
        const problem = priceProblem(sale.salePrice, ticked[i]!.listPrice);
        if (problem)
          ctx.addIssue({ code: 'custom', path: ['sales', i, 'salePrice'], message: problem });
      });
    }),
  );
  const fields: FieldBindings<ReceiptValues> = {
    soldOn: { read: dateCodec, blank: { required: 'Enter the day of the sale.' } },
  };
  ticked.forEach((line, i) => {
    fields[priceField(line)] = {
      read: moneyCodec(line.listPrice.currency),
      path: `sales.${i}.salePrice`,
      blank: { required: 'Enter the price paid.' },
    };
    fields[reasonField(line)] = {
      read: textCodec,
      path: `sales.${i}.discountReason`,
      when: (values) => below(values[priceField(line)], line),
    };
  });
  const binding = bindForm<ReceiptValues, SaleBatchParsed>(schema, fields);
  return {
    ...binding,
    fieldFor: (path) => {
      const match = /^sales\.(\d+)\.(soldOn|lineId)/.exec(path);
      if (match?.[2] === 'soldOn') return 'soldOn';
      const line = match ? ticked[Number(match[1])] : undefined;
      if (line) return priceField(line);
      return binding.fieldFor(path);
    },
  };
}

function Tick({
  line,
  ticked,
  onToggle,
}: {
  line: ConsignmentLine;
  ticked: boolean;
  onToggle: () => void;
}) {
  const { focused, focusProps } = useFocusRing();
  return (
    <Pressable
      role="checkbox"
      aria-checked={ticked}
      accessibilityState={{ checked: ticked }}
      accessibilityLabel={`${line.stockNumber} ${line.title}, ${formatMoney(line.listPrice)}`}
      testID={`receipt-tick-${line.id}`}
      onPress={onToggle}
      {...focusProps}
      style={({ pressed }) => [
        styles.tick,
        ticked && styles.ticked,
        pressed && styles.pressed,
        focused && focusRing,
      ]}
    >
      {/* A filled square when ticked, an open one when not: not colour alone. */}
      <StateGlyph
        shape={ticked ? 'square' : 'open-square'}
        color={ticked ? palette.accent : palette.outline}
      />
      <SquareImage uri={line.thumbnailUrl} size={56} label={`${line.title}, cover photo`} />
      <View style={styles.what}>
        <Text variant="small" style={styles.tabular}>
          {line.stockNumber}
        </Text>
        <Text variant="bodyStrong" numberOfLines={2}>
          {line.title}
        </Text>
        <Text variant="number">{formatMoney(line.listPrice)}</Text>
      </View>
    </Pressable>
  );
}

function ReceiptForm({
  consignment,
  onDone,
  onCancel,
}: {
  consignment: Consignment;
  onDone: (count: number) => void;
  onCancel: () => void;
}) {
  const out = consignment.lines.filter((l) => l.state === 'consigned');
  const [tickedIds, setTickedIds] = useState<number[]>([]);
  const [noneTicked, setNoneTicked] = useState(false);
  const ticked = out.filter((l) => tickedIds.includes(l.id));
  const sell = useSaleBatchMutation(consignment.id);
  const window = { dispatchDate: consignment.dispatchDate, today: consignment.today };
  const defaults: ReceiptValues = { soldOn: consignment.today };
  for (const line of out) {
    defaults[priceField(line)] = moneyText(line.listPrice);
    defaults[reasonField(line)] = '';
  }
  const { control, formState, submit, clearErrors } = useSchemaForm(
    receiptBinding(ticked, window),
    defaults,
  );
  const values = useWatch({ control }) as ReceiptValues;
  const currency = consignment.terms.currency;
  let total = 0;
  let readable = true;
  for (const line of ticked) {
    const read = parseMoneyText(values[priceField(line)] ?? '', currency);
    if (read.kind === 'ok') total += read.value.amount;
    else readable = false;
  }
  const toggle = (id: number) => {
    clearErrors();
    setNoneTicked(false);
    setTickedIds((ids) => (ids.includes(id) ? ids.filter((x) => x !== id) : [...ids, id]));
  };

  return (
    <View style={styles.form} role="form" aria-label="Several pieces sold on one receipt">
      <FormDate control={control} name="soldOn" testID="receipt-date" label="Sold on" />
      <Text variant="label">The pieces on the receipt</Text>
      <View role="list" style={styles.pieces}>
        {out.map((line) => {
          const on = tickedIds.includes(line.id);
          return (
            <View role="listitem" key={line.id} style={styles.piece}>
              <Tick line={line} ticked={on} onToggle={() => toggle(line.id)} />
              {on ? (
                <View style={styles.price}>
                  <FormMoney
                    control={control}
                    name={priceField(line)}
                    testID={`receipt-price-${line.id}`}
                    label={`Price paid for ${line.stockNumber}`}
                    currency={line.listPrice.currency}
                  />
                  {below(values[priceField(line)], line) ? (
                    <FormText
                      control={control}
                      name={reasonField(line)}
                      testID={`receipt-reason-${line.id}`}
                      label="Why less? (optional)"
                    />
                  ) : null}
                </View>
              ) : null}
            </View>
          );
        })}
      </View>
      <View style={styles.total} testID="receipt-total">
        <Text variant="bodyStrong" style={styles.totalLabel}>
          {`Total, ${ticked.length} ${ticked.length === 1 ? 'piece' : 'pieces'}`}
        </Text>
        <Text variant="number" style={styles.totalAmount}>
          {readable ? formatMoney({ amount: total, currency }) : '—'}
        </Text>
      </View>
      <FormFooter
        name="receipt"
        errors={formState.errors}
        aside={<Button label="Never mind" variant="quiet" onPress={onCancel} />}
        submitLabel={
          ticked.length === 0
            ? 'Tick the pieces sold'
            : `Confirm ${ticked.length} ${ticked.length === 1 ? 'sale' : 'sales'}`
        }
        busyLabel="Recording the sales…"
        busy={formState.isSubmitting}
        onSubmit={
          ticked.length === 0
            ? () => setNoneTicked(true)
            : submit(async (batch) => {
                await sell.mutateAsync(batch);
                onDone(batch.sales.length);
              })
        }
        stretch
      >
        {noneTicked ? (
          <Notice testID="receipt-none" message="Tick the pieces on the receipt first." />
        ) : null}
      </FormFooter>
    </View>
  );
}

/**
 * "Sell several": a till receipt of pieces of this consignment sold together, one date, each at
 * its list price unless changed, a total, all recorded or none.
 */
export function TillReceipt({ consignment }: { consignment: Consignment }) {
  const [open, setOpen] = useState(false);
  const [done, setDone] = useState<string | null>(null);
  const outCount = consignment.lines.filter((l) => l.state === 'consigned').length;
  if (outCount < 2 && !done) return null;
  return (
    <Card style={styles.card} testID="till-receipt">
      <Heading level={2}>Sell several</Heading>
      {done ? <Notice tone="info" message={done} testID="receipt-done" /> : null}
      {open ? (
        <ReceiptForm
          consignment={consignment}
          onDone={(count) => {
            setOpen(false);
            setDone(
              `${count} ${count === 1 ? 'sale' : 'sales'} recorded. The maker is e-mailed within minutes.`,
            );
          }}
          onCancel={() => setOpen(false)}
        />
      ) : outCount >= 2 ? (
        <>
          <Text>
            Several pieces on one till receipt: tick them, check the prices, confirm once.
          </Text>
          <View style={styles.start}>
            <Button
              testID="receipt-open"
              label="Sell several"
              variant="secondary"
              onPress={() => {
                setDone(null);
                setOpen(true);
              }}
            />
          </View>
        </>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md },
  form: { gap: spacing.md },
  pieces: { gap: spacing.sm },
  piece: { gap: spacing.sm },
  tick: {
    minHeight: touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    padding: spacing.sm,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: palette.outline,
    backgroundColor: palette.surface,
  },
  ticked: { borderColor: palette.accent, borderWidth: 2, backgroundColor: palette.accentSoft },
  pressed: { backgroundColor: palette.sunken },
  what: { flex: 1, gap: 2 },
  tabular: { fontVariant: ['tabular-nums'] },
  price: { gap: spacing.sm, paddingLeft: spacing.xl },
  total: {
    flexDirection: 'row',
    alignItems: 'baseline',
    gap: spacing.md,
    paddingTop: spacing.sm,
    borderTopWidth: 1,
    borderTopColor: palette.hairline,
  },
  totalLabel: { flex: 1 },
  totalAmount: { fontSize: 21, lineHeight: 28 },
  start: { alignSelf: 'flex-start' },
});
