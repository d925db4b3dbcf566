/** The demo shop's sign-ins, printed by `npm start` and used by the tests. Demo only: change them for real use. */
export const DEMO_ACCOUNTS = {
  owner: { name: 'Maren Holt', email: 'maren@brambleyard.example', password: 'bramble-owner-26' },
  lead: { name: 'Tobias Reyne', email: 'tobias@brambleyard.example', password: 'bramble-lead-26' },
  operators: [
    { name: 'Jo Alder', pin: '2468' },
    { name: 'Sam Okoro', pin: '1357' },
    { name: 'Lin Varga', pin: '8080' },
    { name: 'Rui Castel', pin: '51505' },
  ],
} as const;
