import { useParams } from 'react-router';
import { RoomPage } from '../../features/rooms/components/room-page';

export function RoomRoute() {
  const { projectId = '', roomId = '' } = useParams();
  return <RoomPage projectId={projectId} roomId={roomId} />;
}
