/**
 * The invented people of the demo organisation, Bayhaven Shoreline Trust. Every name and
 * address here is made up; the `demo.ebbroot.test` domain marks them as demo data.
 */
export interface DemoPerson {
  name: string;
  email: string;
  role: 'volunteer' | 'coordinator' | 'admin';
  verified: boolean;
}

export const DEMO_DOMAIN = 'demo.ebbroot.test';
export const DEMO_PASSWORD = 'ebbroot-demo';

const volunteerNames = [
  'Tamsin Okafor', 'Leo Brandt', 'Priya Raman', 'Hollis Greer', 'Noor Haddad', 'Jasper Quill',
  'Marguerite Dube', 'Eli Navarro', 'Saoirse Kell', 'Dmitri Volkov', 'Ada Mensah', 'Rafe Holloway',
  'Yuki Tanabe', 'Celeste Ortega', 'Bram Visser', 'Ines Carvalho', 'Oren Shapiro', 'Wren Ashby',
  'Kofi Boateng', 'Lucia Ferrante', 'Emmett Vance', 'Hana Sato', 'Gideon Pike', 'Maribel Ruiz',
  'Thea Lindqvist', 'Amos Whitlock', 'Zara Idris', 'Caleb Fenwick', 'Rosalind Mbeki', 'Felix Aranda',
  'June Calloway', 'Nico Castellan', 'Odette Fairweather', 'Silas Morrow', 'Ivy Tremaine', 'Mateo Solano',
  'Paloma Reyes', 'Ansel Hart',
];

const slug = (name: string) => name.toLowerCase().replace(/[^a-z]+/g, '.');

export const demoPeople: DemoPerson[] = [
  { name: 'Miriam Alder', email: `admin@${DEMO_DOMAIN}`, role: 'admin', verified: true },
  { name: 'Jonah Whitfield', email: `coordinator@${DEMO_DOMAIN}`, role: 'coordinator', verified: true },
  { name: 'Val Moreno', email: `volunteer@${DEMO_DOMAIN}`, role: 'volunteer', verified: true },
  // Roughly one in five has not confirmed their e-mail yet, so the people list shows both states.
  ...volunteerNames.map((name, i) => ({ name, email: `${slug(name)}@${DEMO_DOMAIN}`, role: 'volunteer' as const, verified: i % 5 !== 3 })),
];
