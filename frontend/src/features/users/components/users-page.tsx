import EditIcon from '@mui/icons-material/Edit';
import EmailOutlinedIcon from '@mui/icons-material/EmailOutlined';
import PersonAddIcon from '@mui/icons-material/PersonAdd';
import { Alert, Box, Button, Stack, Typography } from '@mui/material';
import { DataGrid, GridActionsCellItem, type GridColDef } from '@mui/x-data-grid';
import { ROLE_LABELS, type UserDto } from '@tiermode/shared-types';
import { useState } from 'react';
import { Can } from '@casl/react';
import type { AppAbility } from '@/lib/ability';
import { errorMessages } from '@/lib/api-client';
import { useUsers } from '../api/get-users';
import { useSendSetPasswordLink } from '../api/send-set-password-link';
import { UserFormDialog } from './user-form-dialog';

type DialogState = { mode: 'closed' } | { mode: 'add' } | { mode: 'edit'; user: UserDto };

export function UsersPage() {
  const users = useUsers();
  const [dialog, setDialog] = useState<DialogState>({ mode: 'closed' });
  const sendLink = useSendSetPasswordLink();

  const columns: GridColDef<UserDto>[] = [
    { field: 'name', headerName: 'Name', flex: 1, minWidth: 140 },
    { field: 'email', headerName: 'Email', flex: 1.2, minWidth: 180 },
    {
      field: 'role',
      headerName: 'Role',
      width: 100,
      valueFormatter: (v: UserDto['role']) => ROLE_LABELS[v],
    },
    {
      field: 'active',
      headerName: 'Status',
      width: 110,
      valueFormatter: (v: boolean) => (v ? 'Active' : 'Deactivated'),
    },
    { field: 'licenseNumber', headerName: 'Licence number', width: 140 },
    { field: 'licenseJurisdiction', headerName: 'Jurisdiction', flex: 1, minWidth: 140 },
    { field: 'licenseExpiresOn', headerName: 'Valid through', width: 115 },
    {
      field: 'licensed',
      headerName: 'Licensed',
      width: 90,
      valueFormatter: (v: boolean) => (v ? 'Yes' : 'No'),
    },
    {
      field: 'actions',
      type: 'actions',
      headerName: 'Actions',
      width: 100,
      getActions: ({ row }) => [
        <GridActionsCellItem
          key="edit"
          icon={<EditIcon />}
          label={`Edit ${row.name}`}
          title={`Edit ${row.name}`}
          onClick={() => setDialog({ mode: 'edit', user: row })}
        />,
        <GridActionsCellItem
          key="link"
          icon={<EmailOutlinedIcon />}
          label={`Mail ${row.name} a new set-password link`}
          title={`Mail ${row.name} a new set-password link`}
          disabled={!row.active || sendLink.isPending}
          onClick={() => sendLink.mutate(row)}
        />,
      ],
    },
  ];

  return (
    <Stack spacing={2}>
      <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between' }}>
        <Typography variant="h1">People</Typography>
        <Can<AppAbility> I="create" a="User">
          <Button
            variant="contained"
            startIcon={<PersonAddIcon />}
            onClick={() => setDialog({ mode: 'add' })}
          >
            Add a person
          </Button>
        </Can>
      </Stack>
      <Typography color="text.secondary">
        People are deactivated, never deleted, so the record of who did what stays whole. A reviewer
        may lock calcs only while its licence is current.
      </Typography>
      {users.isError && <Alert severity="error">{errorMessages(users.error).join(' ')}</Alert>}
      {sendLink.isSuccess && (
        <Alert severity="success" role="status" onClose={() => sendLink.reset()}>
          A new set-password link was mailed to {sendLink.data.name} ({sendLink.data.email}); any
          link sent before no longer works.
        </Alert>
      )}
      {sendLink.isError && (
        <Alert severity="error" role="alert">
          {errorMessages(sendLink.error).join(' ')}
        </Alert>
      )}
      <Box sx={{ height: 520, bgcolor: 'background.paper' }}>
        <DataGrid
          aria-label="People"
          rows={users.data ?? []}
          columns={columns}
          loading={users.isPending}
          disableRowSelectionOnClick
          initialState={{ sorting: { sortModel: [{ field: 'name', sort: 'asc' }] } }}
        />
      </Box>
      {dialog.mode !== 'closed' && (
        <UserFormDialog
          key={dialog.mode === 'edit' ? dialog.user.id : 'new'}
          user={dialog.mode === 'edit' ? dialog.user : undefined}
          onClose={() => setDialog({ mode: 'closed' })}
        />
      )}
    </Stack>
  );
}
