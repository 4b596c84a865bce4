/** A plan as the API shows it, with each suite's newest approved version and each target's state. */
export interface PlanView {
  id: string;
  name: string;
  description: string;
  recipients: string[];
  suites: { slug: string; title: string; approvedVersion: number | null }[];
  targets: { name: string; installed: boolean }[];
  createdBy: string;
  updatedAt: string;
}
