import { askQuestionSchema } from '@shared/schemas/question.schema';
import type { Deps } from '@server/deps';
import { askQuestion } from '@server/modules/questions';
import type { Tank, WaterTest } from '@server/modules/tanks';

/** The member's open question about the test on their tank, written through the service. */
export async function questionWorld(
  deps: Deps,
  p: { member: { id: string; displayName: string }; tank: Tank; waterTest: WaterTest },
) {
  const { question } = await deps.dataSource.transaction((tx) =>
    askQuestion(
      tx,
      deps,
      p.tank,
      askQuestionSchema.parse({
        title: 'Is this pH fine?',
        body: 'It read 8.1 this morning.',
        waterTestId: p.waterTest.id,
      }),
      p.member,
    ),
  );
  return { question };
}
