import { NonIdealState } from '@blueprintjs/core';
import { Link } from 'react-router-dom';
import { paths } from '../../config/paths';

export function NotFoundRoute() {
  return (
    <NonIdealState
      icon="path-search"
      title="Nothing at this address"
      description="The page may have moved, or the link is mistyped."
      action={<Link to={paths.trials.href()}>Go to your trials</Link>}
    />
  );
}
