import { BankImportScreen } from '@/components/screens/studio/lazy-studio-screens';
import { PageTitle } from '@/components/ui/page-title';

export default function BankStatementRoute() {
  return (
    <>
      <PageTitle title="Payments from a bank statement · Saggar" />
      <BankImportScreen />
    </>
  );
}
