// The /p/:token route inside the designer's app (the dev server serves one HTML page for every
// path); built pages get the separate entry instead. Loaded with `lazy`, so its chunk stays apart.
import { useParams } from 'react-router';
import { PresentationApp } from './presentation-app';

export function Component() {
  const { token = '' } = useParams();
  return <PresentationApp token={token} />;
}
