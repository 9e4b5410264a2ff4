// Route for one finish in the finish library: reads the finish id from the URL and shows its page.
import { useParams } from 'react-router';
import { FinishDetailPage } from '../../features/finishes/components/finish-detail-page';

export function FinishRoute() {
  const { finishId = '' } = useParams();
  return <FinishDetailPage key={finishId} id={finishId} />;
}
