import type request from 'supertest';
import type { OverviewView } from '../../shared/overview-view';
import type { RunMatrixCell } from '../../shared/run-matrix-cell';
import type { RunView } from '../../shared/run-view';

/** One run of a plan as every screen reads it: the runs list, the run itself, the Overview's plan card, and its matrix. */
export async function runEverywhere(
  agent: request.Agent,
  planId: string,
  runId: string,
): Promise<{ listed: RunView; one: RunView; card: RunView; cells: RunMatrixCell[] }> {
  const listed = (await agent.get(`/api/runs?plan=${planId}`)).body.runs as RunView[];
  const one = (await agent.get(`/api/runs/${runId}`)).body.run as RunView;
  const overview = (await agent.get('/api/overview')).body.overview as OverviewView;
  const card = overview.plans.find((p) => p.planId === planId)!.completed!;
  const cells = (await agent.get(`/api/runs/${runId}/matrix`)).body.cells as RunMatrixCell[];
  return { listed: listed.find((r) => r.id === runId)!, one, card, cells };
}
