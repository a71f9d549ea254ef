import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { analyzeGrid } from '#shared/measurement/check/analyze-grid.ts';
import { bodyOverlay } from '#shared/measurement/plane/body-outline.ts';
import { DisplayUnitsProvider } from '#src/lib/display-units.tsx';
import { BodyCoverageFigure } from './body-coverage-figure.tsx';

/** A plane that falls linearly from 40 mW/cm² at the centre to 0 at ±40 cm: round numbers to check (computed). */
function tentPlane() {
  const readings = [];
  for (const y of [-40, -20, 0, 20, 40]) {
    for (const x of [-40, -20, 0, 20, 40]) {
      readings.push({ distanceCm: 30, xCm: x, yCm: y, value: 40 * (1 - Math.abs(x) / 40) * (1 - Math.abs(y) / 40) });
    }
  }
  return analyzeGrid(readings).planes[0];
}

describe('BodyCoverageFigure', () => {
  it('describes the map over the body in words and draws the outline, zones, isolines and emitting area', () => {
    const overlay = bodyOverlay({ shoulderWidthCm: 42, heightCm: 172 });
    const { container } = render(<BodyCoverageFigure plane={tentPlane()} overlay={overlay} emittingAreaCm={{ width: 30, height: 20 }} label="combined band" />);
    const figure = screen.getByRole('img', { name: /Coverage over the body at 30 cm/ });
    const desc = figure.querySelector('desc')?.textContent ?? '';
    expect(desc).toContain('Coverage map at 30 cm, combined band');
    expect(desc).toContain('42 cm across the shoulders and 172 cm tall');
    expect(desc).toContain('Peak 40.0 mW/cm²');
    expect(desc).toContain('x -40 cm to 40 cm');
    expect(desc).toContain('The emitting area is 30 cm by 20 cm');
    // The emitting area as a rectangle, 30 × 20 cm at the figure's scale.
    const rects = [...container.querySelectorAll('rect')].filter((r) => r.getAttribute('stroke-dasharray') === '8 4');
    expect(rects).toHaveLength(1);
    expect(Number(rects[0].getAttribute('width')) / Number(rects[0].getAttribute('height'))).toBeCloseTo(1.5, 6);
    // Three isolines (80/50/25 %), each a halo and a line.
    expect(container.querySelectorAll('g[fill-rule="evenodd"] path')).toHaveLength(6);
    expect(screen.getByText('Isoline at 50 % of the peak (20.0 mW/cm²)')).toBeTruthy();
  });

  it('labels the axes and the key in the reader’s units', () => {
    localStorage.setItem('benchlight.units', JSON.stringify({ irradiance: 'W/m²', length: 'in' }));
    try {
      render(
        <DisplayUnitsProvider>
          <BodyCoverageFigure plane={tentPlane()} overlay={bodyOverlay()} />
        </DisplayUnitsProvider>,
      );
      // 30 cm = 11.8 in; 40 mW/cm² = 400 W/m² (1 in = 2.54 cm; 1 mW/cm² = 10 W/m²; computed).
      expect(screen.getByRole('img', { name: /Coverage over the body at 11.8 in/ })).toBeTruthy();
      expect(screen.getByText('x (in)')).toBeTruthy();
      expect(screen.getByText('Isoline at 80 % of the peak (320 W/m²)')).toBeTruthy();
    } finally {
      localStorage.removeItem('benchlight.units');
    }
  });
});
