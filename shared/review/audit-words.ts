/** How each audit action reads in the run's trail. */
export const AUDIT_ACTION_WORDS: Record<string, string> = {
  'run-assigned': 'Program assigned',
  'run-submitted': 'Submitted for review',
  'run-returned': 'Returned to the skipper',
  'run-signed-off': 'Signed off',
  'certificate-issued': 'Certificate issued',
  'certificate-downloaded': 'Certificate downloaded',
  'mail-sent': 'E-mail sent',
  'mail-failed': 'E-mail not sent',
  'service-reminder-sent': 'Service reminder sent',
  'first-service-recorded': 'First service recorded',
  'entry-voided': 'Entry voided',
  'run-cancelled': 'Run cancelled',
  'checklist-completed': 'Checklist completed',
  'checklist-reopened': 'Checklist reopened',
};
