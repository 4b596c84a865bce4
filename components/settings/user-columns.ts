/** The users table's column widths on a wide screen, shared by its head and its rows. */
export const USER_COLUMNS = {
  name: { flex: 3, gap: 2 },
  role: { flex: 5 },
  account: { flex: 3 },
  status: { flex: 2 },
} as const;
