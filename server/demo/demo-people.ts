/**
 * Our own invented demo scenario: a small workshop on a fictional harbour, two skippers and
 * six boats. Every name, serial number and figure here is made up for the demo.
 */
export const DEMO_PASSWORD = 'ringseat-demo';

export const DEMO_WORKSHOP = {
  name: 'Tidewright Marine Works',
  address: 'Slipway 4, Kestrel Harbour',
  email: 'desk@tidewright.example',
  timezone: 'Europe/London',
  units: { speed: 'kn', volume: 'L', power: 'kW', temperature: 'C' },
} as const;

export const DEMO_USERS = [
  { key: 'manager', email: 'maren@tidewright.example', name: 'Maren Holt', role: 'manager' },
  { key: 'technician', email: 'ivo@tidewright.example', name: 'Ivo Brandt', role: 'technician' },
  { key: 'skipperA', email: 'sunniva@skipper.example', name: 'Sunniva Okafor', role: 'skipper' },
  { key: 'skipperB', email: 'tomas@skipper.example', name: 'Tomas Reyes', role: 'skipper' },
] as const;
