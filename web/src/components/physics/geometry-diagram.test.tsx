import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { SignGeometry } from '@core/contracts';
import { GeometryDiagram } from './geometry-diagram';

const loop: SignGeometry = {
  conductor: { shape: 'loop', center: [0, 0, 0], radius: 0.05, axis: 'x', current: 'clockwise' },
  point: [0.02, 0, 0],
  component: 'x',
};

describe('GeometryDiagram', { timeout: 20_000 }, () => {
  it('describes the set-up for screen readers without saying where the field points', () => {
    render(<GeometryDiagram geometry={loop} />);
    const figure = screen.getByRole('img', { name: /Current loop and field point/ });
    expect(figure).toHaveAccessibleName(
      'Current loop and field point A circular loop of radius 5 cm in the yz plane, centred at (0, 0, 0) cm, its current clockwise seen from the +x side. Field point P at (2, 0, 0) cm.',
    );
    expect(figure.textContent).not.toMatch(/into|out of|field (is|points)/i);
  });

  it('draws a wire as a segment with its current arrow and the point', () => {
    const { container } = render(
      <GeometryDiagram
        geometry={{ conductor: { shape: 'wire', through: [0, 0.01, 0], axis: 'y', current: '-' }, point: [0.03, 0, 0], component: 'z' }}
      />,
    );
    expect(screen.getByRole('img', { name: /Straight wire and field point.*along the y axis.*towards -y/ })).toBeInTheDocument();
    const conductor = container.querySelector('g.text-copper path');
    expect(conductor?.getAttribute('d')?.split('L')).toHaveLength(2);
    expect(container.querySelector('g.text-teal circle')).not.toBeNull();
  });
});
