import { useNavigate } from 'react-router';
import { useCreateRestoration } from '../../features/restorations/api/create-restoration';
import { RestorationForm } from '../../features/restorations/components/restoration-form';

export function NewRestorationRoute() {
  const navigate = useNavigate();
  const create = useCreateRestoration();
  return (
    <div className="mx-auto max-w-3xl space-y-4">
      <h1 className="text-2xl font-bold">Take in a set</h1>
      <p className="rounded-lg border-l-4 border-glow bg-glow-soft px-4 py-3 text-sm">
        Before any power: photograph everything, note the valve types and their positions, and check the mains lead. Do
        not plug a set in “to see if it works”.
      </p>
      <RestorationForm
        submitLabel="Put it on the bench"
        submitting={create.isPending}
        serverError={create.error?.message}
        onSubmit={(values) =>
          create.mutate(values, { onSuccess: (created) => navigate(`/restorations/${created.id}`) })
        }
      />
    </div>
  );
}
