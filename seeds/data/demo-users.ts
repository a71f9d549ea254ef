import type { Role } from '#shared/auth/capabilities.ts';

// Fictional staff of the demo lab. The README's demo section prints these; keep them in step.
export const DEMO_USERS: readonly { email: string; displayName: string; role: Role; password: string }[] = [
  { email: 'admin@benchlight.test', displayName: 'Ines Varga (demo admin)', role: 'admin', password: 'demo-admin-2026' },
  { email: 'editor@benchlight.test', displayName: 'Tomasz Okafor (demo editor)', role: 'editor', password: 'demo-editor-2026' },
  { email: 'tester@benchlight.test', displayName: 'Mira Lindqvist (demo tester)', role: 'tester', password: 'demo-tester-2026' },
];
