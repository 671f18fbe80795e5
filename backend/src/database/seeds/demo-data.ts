import type { UserRole } from '../../users/entities/user.entity';

/**
 * The demo scenario: an invented studio with invented people. Any likeness to a real studio or
 * person is chance. Addresses use the reserved `.test` domain (RFC 2606), so no mail can leave.
 */
export const demoPassword = 'mixmark-demo';

export const demoStudio = { name: 'Saltmarsh Lane Studio' };

export interface DemoUser {
  email: string;
  displayName: string;
  role: UserRole;
  inStudio: boolean;
}

export const demoUsers: DemoUser[] = [
  { email: 'admin@mixmark.test', displayName: 'Mixmark Admin', role: 'admin', inStudio: false },
  { email: 'tamsin@saltmarsh-lane.test', displayName: 'Tamsin Arvello', role: 'teacher', inStudio: true },
  { email: 'bram@saltmarsh-lane.test', displayName: 'Bram Quillfeather', role: 'student', inStudio: true },
  { email: 'ines@saltmarsh-lane.test', displayName: 'Ines Podmore', role: 'student', inStudio: true },
  { email: 'kofi@saltmarsh-lane.test', displayName: 'Kofi Ashgrove', role: 'student', inStudio: true },
  { email: 'liesl@saltmarsh-lane.test', displayName: 'Liesl Moorcombe', role: 'student', inStudio: true },
  { email: 'ravi@saltmarsh-lane.test', displayName: 'Ravi Tannery', role: 'student', inStudio: true },
  { email: 'sunniva@saltmarsh-lane.test', displayName: 'Sunniva Holt-Ferris', role: 'student', inStudio: true },
  { email: 'theo@saltmarsh-lane.test', displayName: 'Theo Brackenridge', role: 'student', inStudio: true },
  { email: 'yuki@saltmarsh-lane.test', displayName: 'Yuki Penhallow', role: 'student', inStudio: true },
  { email: 'noor@selftaught.test', displayName: 'Noor Castlebrook', role: 'student', inStudio: false },
];

/** The sign-ins the start command prints. */
export const demoSignIns = [
  { who: 'teacher', email: 'tamsin@saltmarsh-lane.test' },
  { who: 'student', email: 'bram@saltmarsh-lane.test' },
  { who: 'self-learner', email: 'noor@selftaught.test' },
  { who: 'admin', email: 'admin@mixmark.test' },
];
