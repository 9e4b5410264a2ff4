// Route for the room editor: reads the project and room ids from the URL and passes in the studio's finishes and piece models.
import { useParams } from 'react-router';
import { EditorPage } from '../../features/rooms/editor/editor-page';
import { useFinishes } from '../../features/finishes/api/finishes';
import { usePieceModels } from '../../features/models/api/models';

export function RoomRoute() {
  const { projectId = '', roomId = '' } = useParams();
  const finishes = useFinishes();
  const models = usePieceModels();
  return (
    <EditorPage projectId={projectId} roomId={roomId} finishes={finishes.data?.finishes ?? []} models={models.data?.models} />
  );
}
