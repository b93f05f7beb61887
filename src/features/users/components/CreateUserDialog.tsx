import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Dialog } from '../../../components/ui/Dialog';
import { useCreateUser } from '../api/create-user';
import { UserForm } from './UserForm';

/** "Add user" button and its dialog. */
export function CreateUserDialog() {
  const [open, setOpen] = useState(false);
  const create = useCreateUser();
  const close = () => {
    setOpen(false);
    create.reset();
  };
  return (
    <>
      <Button variant="primary" onClick={() => setOpen(true)}>
        Add user
      </Button>
      <Dialog open={open} onClose={close} title="Add a user">
        <UserForm busy={create.isPending} error={create.error} onCancel={close} onSubmit={(v) => create.mutate(v, { onSuccess: close })} />
      </Dialog>
    </>
  );
}
