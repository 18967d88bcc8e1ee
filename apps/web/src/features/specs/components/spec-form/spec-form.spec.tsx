import type { Material } from '@evenset/contracts';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { installFakeFetch } from '../../../../testing/fake-fetch';
import { newSpecValues, type SpecFormValues } from '../../spec-values';
import { SpecForm } from './spec-form';

const steel: Material = {
  id: '3f2c1a9e-8d7b-4c6a-9e5f-1a2b3c4d5e6f',
  name: 'Hardened steel',
  expansionPerK: 11.5,
  source: 'ISO 3650:1998',
  confidence: 'firm',
};

/** RB-40 rev B from the brief, with the problems each test adds. */
function riserBlock(change: (values: SpecFormValues) => void): SpecFormValues {
  const values = newSpecValues('in');
  values.partNumber = 'RB-40';
  Object.assign(values.definition, {
    title: 'Riser block',
    materialId: steel.id,
    nominal: 1.5,
    band: { lower: -0.0004, upper: 0 },
    matchingBand: 0.0002,
    setSize: 4,
    plan: {
      stations: [
        { name: 'A', x: 0.2, y: 0.2 },
        { name: 'B', x: 1.3, y: 0.2 },
        { name: 'C', x: 1.3, y: 1.3 },
      ],
      datumStations: [],
      runoutCircles: [],
    },
  });
  change(values);
  return values;
}

function renderForm(defaultValues: SpecFormValues) {
  const requests = installFakeFetch(() => ({ status: 500 }));
  const onSaved = jest.fn();
  render(<SpecForm defaultValues={defaultValues} materials={[steel]} onSaved={onSaved} onCancel={() => undefined} />);
  return { user: userEvent.setup(), requests, onSaved };
}

describe('SpecForm validation', () => {
  it('says what is missing in an empty spec and sends nothing', async () => {
    const { user, requests, onSaved } = renderForm(newSpecValues('in'));
    await user.click(screen.getByRole('button', { name: 'Create draft' }));

    expect(await screen.findByText('Add at least one station.')).toBeInTheDocument();
    expect(screen.getByText('Enter a title.')).toBeInTheDocument();
    expect(screen.getByText('Choose a material.')).toBeInTheDocument();
    expect(screen.getByText('Enter the nominal height as a number.')).toBeInTheDocument();
    expect(screen.getByText('Some entries need attention; each problem is marked where it is.')).toBeInTheDocument();
    expect(requests).toHaveLength(0);
    expect(onSaved).not.toHaveBeenCalled();
  });

  it('refuses an unreadable number and a negative limit where they were typed', async () => {
    const { user } = renderForm(riserBlock(() => undefined));
    const nominal = screen.getByRole('textbox', { name: 'Nominal height' });
    await user.clear(nominal);
    await user.type(nominal, '1.2.3');
    await user.type(screen.getByRole('textbox', { name: 'Flatness' }), '-0.0001');
    await user.click(screen.getByRole('button', { name: 'Create draft' }));

    expect(await screen.findByText('Enter the nominal height as a number.')).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'Nominal height' })).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText('The flatness limit cannot be negative.')).toBeInTheDocument();
  });

  it('names duplicate stations and a band whose lower deviation is above the upper', async () => {
    const { user, requests } = renderForm(
      riserBlock((values) => {
        values.definition.band = { lower: 0.0002, upper: -0.0002 };
        values.definition.plan.stations.push({ name: 'B', x: 0.2, y: 1.3 });
      }),
    );
    await user.click(screen.getByRole('button', { name: 'Create draft' }));

    expect(await screen.findByText('The lower deviation must be below the upper deviation.')).toBeInTheDocument();
    const stations = screen.getByRole('table', { name: 'Top-face stations' });
    expect(
      within(stations).getByText('Station name "B" is already used in the top-face stations.'),
    ).toBeInTheDocument();
    expect(requests).toHaveLength(0);
  });

  it('asks for a height station when the height is one named station', async () => {
    const { user } = renderForm(riserBlock(() => undefined));
    await user.click(screen.getByRole('radio', { name: /One named station/ }));
    await user.click(screen.getByRole('button', { name: 'Create draft' }));
    expect(await screen.findByText('Name the station whose reading is the height.')).toBeInTheDocument();
  });
});
