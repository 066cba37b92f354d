import { useLocation } from 'react-router';
import { Card } from '../../components/ui/card';
import { PageHeader } from '../../components/ui/page-header';

const TEXT: Record<string, { title: string; body: string }> = {
  '/tanks': { title: 'My tanks', body: 'Logging tanks and water tests is the next part of Shoalwise to open. Your club admin will tell you when it is ready.' },
  '/desk': { title: 'Mentor desk', body: 'The live list of your mentees’ tanks, most worrying first, opens once tank logging is ready.' },
};

export function Component() {
  const { pathname } = useLocation();
  const t = TEXT[pathname] ?? { title: 'Not open yet', body: 'This part of Shoalwise is not open yet.' };
  return (
    <>
      <PageHeader title={t.title} />
      <Card>
        <p className="text-tide-800">{t.body}</p>
      </Card>
    </>
  );
}
