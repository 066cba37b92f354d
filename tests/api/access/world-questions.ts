import type { DataSource } from 'typeorm';
import { askQuestionSchema } from '../../../shared/schemas/question.schema';
import { askQuestion } from '../../../server/modules/questions/question.service';
import type { Tank } from '../../../server/modules/tanks/tank.entity';
import type { WaterTest } from '../../../server/modules/tanks/water-test.entity';

/** The member's open question about the test on their tank, written through the service. */
export async function questionWorld(ds: DataSource, p: { member: { id: string; displayName: string }; tank: Tank; waterTest: WaterTest }) {
  const { question } = await ds.transaction((tx) =>
    askQuestion(tx, p.tank, askQuestionSchema.parse({ title: 'Is this pH fine?', body: 'It read 8.1 this morning.', waterTestId: p.waterTest.id }), p.member),
  );
  return { question };
}
