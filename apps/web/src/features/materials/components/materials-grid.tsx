import type { Material } from '@evenset/contracts';
import EditOutlined from '@mui/icons-material/EditOutlined';
import { GridActionsCellItem, type GridColDef } from '@mui/x-data-grid';
import { useMemo, useState } from 'react';
import { AppDataGrid } from '../../../components/app-data-grid';
import { figuresColumn } from '../../../components/data-grid/length-column';
import { useGridListQuery } from '../../../components/data-grid/use-grid-list-query';
import { useMaterials } from '../api/get-materials';
import { MaterialDialog } from './material-dialog';

function materialColumns(onEdit: ((material: Material) => void) | null): GridColDef<Material>[] {
  const columns: GridColDef<Material>[] = [
    { field: 'name', headerName: 'Material', flex: 1, minWidth: 220 },
    figuresColumn<Material>({
      field: 'expansionPerK',
      headerName: 'Expansion (10⁻⁶/K)',
      width: 170,
      valueFormatter: (value: number) => value.toFixed(1),
    }),
    { field: 'source', headerName: 'Source', flex: 1.6, minWidth: 280, sortable: false },
    {
      field: 'confidence',
      headerName: 'Confidence',
      width: 140,
      sortable: false,
      valueFormatter: (value: Material['confidence']) => (value === 'firm' ? 'Firm' : 'From memory'),
    },
  ];
  if (!onEdit) return columns;
  return [
    ...columns,
    {
      field: 'actions',
      type: 'actions',
      headerName: 'Actions',
      width: 90,
      getActions: ({ row }) => [
        <GridActionsCellItem
          key="edit"
          icon={<EditOutlined />}
          label={`Edit ${row.name}`}
          onClick={() => onEdit(row)}
        />,
      ],
    },
  ];
}

/** The materials table; engineers may edit a row (`canEdit`), everyone else reads it. */
export function MaterialsGrid({ canEdit }: { canEdit: boolean }) {
  const list = useGridListQuery([{ field: 'name', sort: 'asc' }]);
  const request = useMaterials(list.query);
  const [editing, setEditing] = useState<Material | null>(null);
  const columns = useMemo(() => materialColumns(canEdit ? setEditing : null), [canEdit]);
  return (
    <>
      <AppDataGrid
        label="Materials"
        columns={columns}
        request={request}
        list={list}
        searchLabel="Search materials"
        emptyState={{ title: 'No materials yet', hint: 'Add the first material with “Add material” above.' }}
        csvFileName="evenset-materials"
      />
      {editing ? <MaterialDialog material={editing} onClose={() => setEditing(null)} /> : null}
    </>
  );
}
