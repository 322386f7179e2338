// Every screen of the studio side. Imported only through `lazy-studio-screens.tsx`, so that they
// and everything only they use (forms, tables, photos, money rules) load together as one chunk.
export { BankImportScreen } from '../bank-import/bank-import-screen';
export { ConsignmentScreen } from '../consignment/consignment-screen';
export { ConsignmentCreateScreen } from '../consignment-form/consignment-create-screen';
export { ConsignmentsScreen } from '../consignments/consignments-screen';
export { MailScreen } from '../mail/mail-screen';
export { MailMessageScreen } from '../mail/message-screen';
export { MoreScreen } from '../more/more-screen';
export { OverviewScreen } from '../overview/overview-screen';
export { SettingsScreen } from '../settings/settings-screen';
export { StatementScreen } from '../statement/statement-screen';
export { StatementsScreen } from '../statement/statements-screen';
export { VenueScreen } from '../venue/venue-screen';
export { VenueCreateScreen } from '../venue-form/venue-create-screen';
export { VenueEditScreen } from '../venue-form/venue-edit-screen';
export { VenuesScreen } from '../venues/venues-screen';
export { WorkScreen } from '../work/work-screen';
export { WorkCreateScreen } from '../work-form/work-create-screen';
export { WorkEditScreen } from '../work-form/work-edit-screen';
export { WorkImportScreen } from '../work-import/work-import-screen';
export { WorksScreen } from '../works/works-screen';
export { YearScreen } from '../year/year-screen';
