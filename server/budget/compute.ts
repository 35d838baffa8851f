// What a budget worker runs: check the stored plan against the engine's contract, simulate it, and hand back the
// answer already serialised, so the server's event loop never walks a large result.
import { simulateParsed } from '@/shared/engine';
import { engineInputSchema, type EngineInputDraft } from '@/shared/schemas/engine-input';

/** The figures the trips list shows of a budget. */
export type BudgetFigures = { lowestSocPct: number; reservePct: number; flagCount: number };

export type BudgetOutcome =
  | { kind: 'ok'; resultJson: string; figures: BudgetFigures }
  | { kind: 'invalid'; reason: string }
  | { kind: 'failed'; message: string };

export function computeBudget(draft: EngineInputDraft): BudgetOutcome {
  const parsed = engineInputSchema.safeParse(draft);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return { kind: 'invalid', reason: `The plan cannot be simulated yet: ${issue?.path.join('.')} ${issue?.message}` };
  }
  try {
    const result = simulateParsed(parsed.data);
    const { lowestSocPct, reservePct } = result.headline;
    return {
      kind: 'ok',
      resultJson: JSON.stringify(result),
      figures: { lowestSocPct, reservePct, flagCount: result.flags.length },
    };
  } catch (error) {
    // An engine fault is reported, not thrown: the pool keeps its worker and the server logs the message.
    return { kind: 'failed', message: error instanceof Error ? `${error.name}: ${error.message}` : String(error) };
  }
}
