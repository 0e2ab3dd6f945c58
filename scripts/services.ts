// Long-running companion processes started beside the web server by scripts/serve.ts.
// Each is a Node script started directly (not through npx) so its PID is the process.
export const services: { name: string; args: string[] }[] = [
  // The local SMTP fake (port from SMTP_PORT), storing mail for the /dev/mailbox page.
  { name: 'mail', args: ['--conditions=react-server', '--import', 'tsx', 'scripts/mail-catcher.ts'] },
];
