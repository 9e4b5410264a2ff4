// Route for one piece model in the library: reads the model id from the URL and shows its page.
import { useParams } from 'react-router';
import { ModelDetailPage } from '../../features/models/components/model-detail-page';

export function ModelRoute() {
  const { modelId = '' } = useParams();
  return <ModelDetailPage key={modelId} id={modelId} />;
}
