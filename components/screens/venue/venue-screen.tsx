import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConsignmentCard } from '@/components/ui/consignment-card';
import { percentText } from '@/components/ui/decimal-text';
import { FieldList } from '@/components/ui/field-list';
import { Screen } from '@/components/ui/screen';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { palette, spacing } from '@/constants/theme';
import { useVenueQuery } from '@/hooks/queries/venues';
import { useActiveRole } from '@/hooks/session';
import { formatMoney } from '@/shared/money/format';
import { type VenueDetail } from '@/shared/schemas/venue';

import {
  commissionVatText,
  discountRuleWords,
  insuranceBasisWords,
  insurerWords,
  makerVatText,
  paymentFromWords,
  venueKindWords,
  venueRoleWords,
} from '../venue-form/venue-words';

function VenueBody({ detail }: { detail: VenueDetail }) {
  const { venue, consignments, staff } = detail;
  // Only the owner sets terms; anyone else edits the details alone.
  const owner = useActiveRole() === 'owner';
  const terms = venue.defaultTerms;
  const address = [
    venue.addressLine1,
    venue.addressLine2,
    venue.town,
    venue.postcode,
    venue.country,
  ]
    .filter(Boolean)
    .join(', ');
  return (
    <>
      <View style={styles.heading}>
        <TextLink href="/venues" label="All venues" />
        <Text variant="small">{venueKindWords[venue.kind]}</Text>
        <Heading level={1} testID="venue-name">
          {venue.name}
        </Heading>
        <Link href={{ pathname: '/venues/[id]/edit', params: { id: String(venue.id) } }} asChild>
          <Button
            testID="venue-edit"
            label={owner ? 'Edit venue and terms' : 'Edit venue details'}
            variant="secondary"
          />
        </Link>
      </View>
      <Card>
        <Heading level={2}>Details</Heading>
        <FieldList
          items={[
            { label: 'Address', value: address || '—' },
            { label: 'Contact', value: venue.contactName ?? '—' },
            { label: 'E-mail', value: venue.email ?? '—' },
            { label: 'Phone', value: venue.phone ?? '—' },
            { label: 'VAT number', value: venue.vatNumber ?? 'Not VAT-registered, or not known' },
            { label: 'Notes', value: venue.notes ?? '—' },
          ]}
        />
      </Card>
      <Card>
        <Heading level={2}>Default terms</Heading>
        <FieldList
          items={[
            {
              label: 'Commission',
              value: `${percentText(terms.commissionRateBp)}%`,
              numeric: true,
              testID: 'venue-commission',
            },
            { label: 'The venue', value: venueRoleWords[terms.venueRole] },
            {
              label: 'VAT on commission',
              value: commissionVatText(terms),
              testID: 'venue-commission-vat',
            },
            { label: 'You are VAT-registered', value: makerVatText(terms) },
            { label: 'Discounts', value: discountRuleWords[terms.discountRule] },
            {
              label: 'Insured at',
              value:
                terms.insuranceBasis === 'agreed' && terms.agreedInsuranceValue
                  ? `${insuranceBasisWords.agreed}: ${formatMoney(terms.agreedInsuranceValue)}`
                  : insuranceBasisWords[terms.insuranceBasis],
            },
            { label: 'Insured on the premises by', value: insurerWords[terms.insuredBy] },
            { label: 'Insured in transit by', value: insurerWords[terms.insuredInTransitBy] },
            {
              label: 'Payment',
              value: `Within ${terms.paymentTerms.days} days of ${paymentFromWords[terms.paymentTerms.from]}`,
            },
            { label: 'Currency', value: terms.currency },
          ]}
        />
      </Card>
      <View style={styles.section}>
        <Heading level={2}>Consignments</Heading>
        {consignments.length === 0 ? (
          <EmptyView
            title="Nothing sent here yet"
            message={`Batches of work sent to ${venue.name} are listed here, with how each is going.`}
          />
        ) : (
          consignments.map((c) => (
            <ConsignmentCard
              key={c.id}
              consignment={c}
              showVenue={false}
              href={{ pathname: '/consignments/[id]', params: { id: String(c.id) } }}
            />
          ))
        )}
      </View>
      <View style={styles.section}>
        <Heading level={2}>Staff who may sign in</Heading>
        {staff.length === 0 ? (
          <EmptyView
            title="No one from the venue yet"
            message="When work is dispatched, the venue’s staff are invited to sign in and record sales here."
          />
        ) : (
          <Card role="list" style={styles.list}>
            {staff.map((person, index) => (
              <View
                key={person.userId}
                role="listitem"
                style={[styles.item, index > 0 && styles.divided]}
              >
                <Text variant="bodyStrong">{person.name}</Text>
                <Text variant="small">{person.email}</Text>
              </View>
            ))}
          </Card>
        )}
      </View>
    </>
  );
}

export function VenueScreen({ id }: { id: number }) {
  const venue = useVenueQuery(id);
  return (
    <Screen testID="venue-screen">
      {venue.isPending ? (
        <LoadingView message="Fetching the venue…" />
      ) : venue.isError ? (
        <ErrorView error={venue.error} onRetry={() => venue.refetch()} />
      ) : (
        <VenueBody detail={venue.data} />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs, alignItems: 'flex-start' },
  section: { gap: spacing.md },
  list: { gap: 0 },
  item: { paddingVertical: spacing.sm, gap: spacing.xxs },
  divided: { borderTopWidth: 1, borderTopColor: palette.hairline },
});
