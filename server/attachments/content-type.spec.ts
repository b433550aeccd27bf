import { describe, expect, it } from 'vitest';
import { nameForType } from './content-type';

describe('nameForType', () => {
  it('keeps a name whose extension is one of the type’s, in any case', () => {
    expect(nameForType('plan.PNG', 'image/png')).toBe('plan.PNG');
    expect(nameForType('site photo.jpeg', 'image/jpeg')).toBe('site photo.jpeg');
    expect(nameForType('site photo.JPG', 'image/jpeg')).toBe('site photo.JPG');
    expect(nameForType('quote.pdf', 'application/pdf')).toBe('quote.pdf');
  });

  it('replaces any other extension by the type’s, so the saved file opens as what it is', () => {
    expect(nameForType('invoice.html', 'image/png')).toBe('invoice.png');
    expect(nameForType('invoice.HTM', 'application/pdf')).toBe('invoice.pdf');
    expect(nameForType('photo.png', 'image/jpeg')).toBe('photo.jpg');
    expect(nameForType('drawing.svg', 'image/webp')).toBe('drawing.webp');
    expect(nameForType('archive.tar.gz', 'application/pdf')).toBe('archive.tar.pdf');
  });

  it('adds the type’s extension to a name without one', () => {
    expect(nameForType('scan', 'application/pdf')).toBe('scan.pdf');
    expect(nameForType('scan.', 'image/png')).toBe('scan.png');
    expect(nameForType('.htaccess', 'image/png')).toBe('.htaccess.png');
  });
});
