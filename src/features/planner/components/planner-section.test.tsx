import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { PlannerSection } from './planner-section.tsx';

/**
 * A small synthetic unit: a smooth bell that widens and dims with distance, read every 10 cm
 * over ±40 cm at 15 and 30 cm (mW/cm²).
 */
function syntheticPlanes() {
  return [15, 30].map((distanceCm) => {
    const points = [];
    for (let y = -40; y <= 40; y += 10) {
      for (let x = -40; x <= 40; x += 10) {
        const wx = 20 + distanceCm / 2;
        const wy = 16 + distanceCm / 2;
        const value = 60 * (15 / distanceCm) ** 0.8 * Math.exp(-(x * x) / (2 * wx * wx) - (y * y) / (2 * wy * wy));
        points.push({ xCm: x, yCm: y, value });
      }
    }
    return { distanceCm, points };
  });
}

/** The planner solves a few linear programmes on the main thread here (jsdom has no Worker). */
const slow = { timeout: 15000 };

function bestTable() {
  return screen.getByRole('table', { name: /Best plan of each kind/ });
}

describe('PlannerSection', () => {
  it('ranks plans of every kind, draws the chosen one, and re-plans when the body size changes', slow, async () => {
    const user = userEvent.setup();
    render(<PlannerSection planes={syntheticPlanes()} unitLabel="Synthetic panel" />);

    // Defaults: chest + abdomen, medium body, 10 J/cm², 90 %.
    expect((screen.getByRole('checkbox', { name: 'Chest' }) as HTMLInputElement).checked).toBe(true);
    expect((screen.getByRole('checkbox', { name: 'Abdomen' }) as HTMLInputElement).checked).toBe(true);
    expect((screen.getByRole('radio', { name: /Medium/ }) as HTMLInputElement).checked).toBe(true);
    expect((screen.getByRole('radio', { name: '10' }) as HTMLInputElement).checked).toBe(true);
    expect((screen.getByLabelText(/Share of the area/) as HTMLInputElement).value).toBe('90');

    await screen.findByText(/plans, ranked by total minutes\./, {}, slow);
    const rows = within(bestTable()).getAllByRole('rowheader').map((r) => r.textContent);
    expect(rows.sort()).toEqual(['Moved between positions', 'One position, centred', 'Units side by side']);
    const medium = bestTable().textContent;

    // The chosen plan's dose map, its text alternative, and the notice that goes with every plan.
    expect(screen.getByRole('img', { name: /Dose map of the plan at \d+ cm/ })).toBeTruthy();
    expect(screen.getByText(/arithmetic on our measurements of this unit, not treatment advice/)).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Cautions for these plans' })).toBeTruthy();
    expect(screen.getByRole('table', { name: /Dose at each 2 cm cell/ })).toBeTruthy();

    await user.click(screen.getByRole('radio', { name: /Small/ }));
    await waitFor(() => expect(bestTable().textContent).not.toBe(medium), slow);
    await screen.findByText(/plans, ranked by total minutes\./, {}, slow);
  });

  it('shows another plan on the map on request, and prints it on a card with the cautions', slow, async () => {
    const user = userEvent.setup();
    render(<PlannerSection planes={syntheticPlanes()} unitLabel="Synthetic panel" />);
    await screen.findByText(/plans, ranked by total minutes\./, {}, slow);

    // The first-ranked plan is on the map; show the best plan of another kind instead.
    const other = within(bestTable())
      .getAllByRole('row')
      .find((row) => within(row).queryByRole('button', { name: /Show on map/ }))!;
    const strategy = within(other).getByRole('rowheader').textContent!;
    await user.click(within(other).getByRole('button', { name: /Show on map/ }));
    expect(within(other).getByRole('button', { name: /On the map/ }).getAttribute('aria-pressed')).toBe('true');
    expect(screen.getByRole('heading', { level: 3, name: new RegExp(`^${strategy}, \\d+ cm$`) })).toBeTruthy();
    const summary = screen.getByRole('heading', { level: 3, name: new RegExp(`^${strategy}`) }).nextElementSibling!.textContent!;

    let card: HTMLElement | null = null;
    const print = vi.spyOn(window, 'print').mockImplementation(() => {
      card = screen.getByTestId('plan-card');
      expect(document.documentElement.classList.contains('bl-printing-plan-card')).toBe(true);
      window.dispatchEvent(new Event('afterprint'));
    });
    await user.click(screen.getByRole('button', { name: 'Print plan card' }));
    expect(print).toHaveBeenCalledTimes(1);
    expect(card).not.toBeNull();
    const printed = within(card!);
    expect(printed.getByRole('heading', { name: 'Session plan card: Synthetic panel' })).toBeTruthy();
    expect(printed.getByText(summary)).toBeTruthy();
    expect(printed.getByRole('heading', { name: 'Cautions for these plans' })).toBeTruthy();
    expect(printed.getByText(/arithmetic on our measurements of this unit, not treatment advice/)).toBeTruthy();
    await waitFor(() => expect(screen.queryByTestId('plan-card')).toBeNull());
    expect(document.documentElement.classList.contains('bl-printing-plan-card')).toBe(false);
  });

  it('asks for a zone instead of planning none', async () => {
    const user = userEvent.setup();
    render(<PlannerSection planes={syntheticPlanes()} />);
    await user.click(screen.getByRole('checkbox', { name: 'Chest' }));
    await user.click(screen.getByRole('checkbox', { name: 'Abdomen' }));
    expect(screen.getByText('Choose at least one body zone.')).toBeTruthy();
    expect(screen.getByText('Complete the choices above to see plans.')).toBeTruthy();
  });
});
