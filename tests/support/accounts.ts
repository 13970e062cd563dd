export { DEMO_PASSWORD } from '@/seeds/01_users';

export const ACCOUNTS = {
  admin: 'admin@kestrelvale.example',
  editor: 'editor@kestrelvale.example',
  engineer: 'engineer@kestrelvale.example',
  buyer: 'buyer@kestrelvale.example',
} as const;
