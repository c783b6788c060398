import demo from '@data/seed/demo-assembly.json';
import { type Project, projectClimateSchema } from '@shared/schemas/project';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { weatherFile } from '../../../../tests/setup/weather-file';
import { UnitSystemProvider } from '../../../lib/unit-system';
import { climateToForm } from '../climate-form';
import { ClimateForm } from './ClimateForm';

afterEach(cleanup);

const project = {
  id: '11111111-1111-4111-8111-111111111111',
  indoorTempC: 18,
  indoorRh: 0.45,
} as Project;
const demoClimate = projectClimateSchema.parse(demo.climate);

function renderForm(climate: typeof demoClimate | null, system: 'SI' | 'IP', onSubmit = vi.fn()) {
  const router = createMemoryRouter(
    [
      {
        path: '/',
        element: <ClimateForm project={project} defaultValues={climateToForm(climate)} onSubmit={onSubmit} />,
      },
    ],
    { initialEntries: ['/'] },
  );
  render(
    <UnitSystemProvider value={system}>
      <RouterProvider router={router} />
    </UnitSystemProvider>,
  );
  return onSubmit;
}

const box = (label: RegExp) => screen.getByLabelText(label) as HTMLInputElement;

describe('ClimateForm', () => {
  it('shows the months in °F and % for IP, and says the demo climate is invented', () => {
    renderForm(demoClimate, 'IP');
    expect(box(/^January mean exterior temperature, in °F/).value).toBe('10.4');
    expect(box(/^January mean exterior relative humidity, in %/).value).toBe('84');
    expect(screen.getByText('These are invented demo values, not a real place.')).toBeTruthy();
    expect((screen.getByLabelText('Humidity class') as HTMLSelectElement).value).toBe('3');
  });

  it('fills a column pasted from a spreadsheet and saves SI values with the fixed indoor conditions', async () => {
    const onSubmit = renderForm(null, 'IP', vi.fn().mockResolvedValue(undefined));
    const temps = [14, 18, 28, 40, 52, 62, 68, 66, 58, 46, 34, 22];
    fireEvent.paste(box(/^January mean exterior temperature/), {
      clipboardData: { getData: () => temps.map((t, k) => `${t}\t${70 + k}%`).join('\n') },
    });
    expect(screen.getByText('Pasted 24 values from January down.')).toBeTruthy();
    expect(box(/^December mean exterior temperature/).value).toBe('22');
    fireEvent.change(screen.getByLabelText(/Source/), { target: { value: 'Station C, 1991–2020' } });
    fireEvent.click(screen.getByLabelText(/The project’s fixed indoor design conditions/));
    fireEvent.click(screen.getByRole('button', { name: 'Save the climate' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    const saved = onSubmit.mock.calls[0]![0];
    expect(saved.humidityClass).toBeUndefined();
    expect(saved.source).toBe('Station C, 1991–2020');
    expect(saved.months[0].exteriorTemperature).toBeCloseTo(-10, 10);
    expect(saved.months[11].exteriorRelativeHumidity).toBeCloseTo(0.81, 10);
  });

  it('names an unreadable or missing month in words and does not save', async () => {
    const onSubmit = renderForm(demoClimate, 'SI');
    fireEvent.change(box(/^March mean exterior temperature/), { target: { value: '4,5' } });
    fireEvent.blur(box(/^March mean exterior temperature/));
    expect(
      screen.getByText(
        '“4,5”: write decimals with a point and no thousands separators (for example 12.5 °C)',
      ),
    ).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Save the climate' }));
    expect(await screen.findByText('One value needs attention.')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
    expect(document.body.textContent).not.toContain('NaN');
  });

  it('fills the months and names the station from an EnergyPlus weather file (invented station)', async () => {
    const onSubmit = renderForm(null, 'SI', vi.fn().mockResolvedValue(undefined));
    const text = weatherFile((m) => [m - 3, 75]);
    const file = new File([text], 'gullhaven.epw', { type: '' });
    fireEvent.change(screen.getByLabelText(/fill the months from a weather file/), {
      target: { files: [file] },
    });
    expect(await screen.findByText(/Read 8760 hours of Gullhaven Point/)).toBeTruthy();
    expect(box(/^January mean exterior temperature/).value).toBe('-3');
    expect(box(/^December mean exterior relative humidity/).value).toBe('75');
    expect((screen.getByLabelText(/Source/) as HTMLInputElement).value).toMatch(
      /^Gullhaven Point, North Reach, XXA, WMO 990001/,
    );
    fireEvent.click(screen.getByRole('button', { name: 'Save the climate' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0]![0].months[11].exteriorTemperature).toBeCloseTo(8, 10);
  });

  it('says why a file is not a weather file and changes nothing', async () => {
    renderForm(demoClimate, 'SI');
    const before = box(/^January mean exterior temperature/).value;
    const file = new File(['month,theta\n1,2'], 'months.csv', { type: 'text/csv' });
    fireEvent.change(screen.getByLabelText(/fill the months from a weather file/), {
      target: { files: [file] },
    });
    expect(
      await screen.findByText(/months\.csv could not be read: this is not an EnergyPlus weather file/),
    ).toBeTruthy();
    expect(box(/^January mean exterior temperature/).value).toBe(before);
  });
});
