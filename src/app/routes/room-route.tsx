import { useParams } from 'react-router';
import { EditorPage } from '../../features/rooms/editor/editor-page';

export function RoomRoute() {
  const { projectId = '', roomId = '' } = useParams();
  return <EditorPage projectId={projectId} roomId={roomId} />;
}
