import { fieldLabel } from '../../shared/field-label';

describe('fieldLabel', () => {
  it.each([
    ['paths.0.samples', 'Path 1 · samples'],
    ['paths.2.center.re', 'Path 3 · center · real part'],
    ['paths.0.points.3.im', 'Path 1 · point 4 · imaginary part'],
    ['paths.1.offsets.0', 'Path 2 · offset 1'],
    ['paths.1.at.4', 'Path 2 · t 5'],
    ['paths.0.start_angle', 'Path 1 · start angle'],
    ['paths.0.cut.through', 'Path 1 · cut · through'],
    ['branch.cuts.1.points.0.re', 'Branch · Cut 2 · point 1 · real part'],
    ['properties.0.region.radius', 'Property 1 · region · radius'],
    ['counterparts.3.subject', 'Counterpart 4 · subject'],
    ['tolerances.values.ulps', 'Tolerances · values · ulps'],
    ['subject', 'Subject'],
    ['paths', 'Paths'],
    ['(body)', 'the whole suite'],
    ['file.paths.0.radius', 'Path 1 · radius'],
    ['body.paths.9.name', 'Path 10 · name'],
  ])('says %s as the form does: %s', (field, label) => {
    expect(fieldLabel(field)).toBe(label);
  });
});
