import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { LengthField } from '../../../src/components/ui/LengthField';

const noop = () => {};

describe('LengthField', () => {
  it('shows millimetres as a plain number and echoes the feet-inches', () => {
    const html = renderToStaticMarkup(<LengthField label="Root gap" valueMm={3} units="mm" onChangeMm={noop} />);
    expect(html).toContain('value="3"');
    expect(html).toContain('≈ 1/8&quot;');
  });

  it('shows a feet-inches job the length as the tape reads, with the stored millimetres', () => {
    // 50 mm = 1.9685 in, to the nearest 1/16" = 1 15/16".
    const html = renderToStaticMarkup(<LengthField label="Shortest piece" valueMm={50} units="ft-in" onChangeMm={noop} />);
    expect(html).toContain('value="1 15/16&quot;"');
    expect(html).toContain('= 50.0 mm');
  });
});
