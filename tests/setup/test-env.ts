/** Ports and names of the test run; all on loopback and apart from `npm start`'s, so both can run at once. */
export const TEST_PG_PORT = 5185;
export const BROWSER_APP_PORT = 5190;
export const BROWSER_FAKE_PORTS = { stripe: 5191, mailInspect: 5192, oauth: 5193, smtp: 2526 };
