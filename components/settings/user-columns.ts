/** The users table's column widths on a wide screen, shared by its head and its rows. */
export const USER_COLUMNS = {
  name: { flex: 3, gap: 2 },
  // The four role chips on one line are 431 px wide (measured at 1440 × 900, where the columns
  // share 1,040 px): at flex 5 of 13 the column had 400 px and every row took two lines of
  // chips; 6.5 of 14.5 gives it 466 px.
  role: { flex: 6.5 },
  account: { flex: 3 },
  status: { flex: 2 },
} as const;
