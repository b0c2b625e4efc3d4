import { EditorsOnly } from '@/components/designs/EditorsOnly';
import { NewDesignScreen } from '@/components/designs/NewDesignScreen';

export default function NewDesignRoute() {
  return (
    <EditorsOnly screen="New design">
      <NewDesignScreen />
    </EditorsOnly>
  );
}
