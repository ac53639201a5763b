import { describe, expect, it } from 'vitest';
import { parseProcedureDocument } from '@shared/engine/procedure-schema';
import { pictureIdsOf, procedurePicturePath, unknownPictures } from '@shared/procedures/pictures';
import { fixtureProcedure } from '../../support/fixture-procedure';

const A = '0b6f1d52-8c1e-4f0a-9d3b-2a7c5e4f1a01';
const B = '0b6f1d52-8c1e-4f0a-9d3b-2a7c5e4f1a02';

function withPictures() {
  const doc = fixtureProcedure();
  doc.checks[0].pictures = [
    { src: A, alt: 'Connector P1 from the wire side' },
    { src: B, alt: 'Where P1 sits under the seat' },
  ];
  doc.checks[1].pictures = [{ src: A, alt: 'Connector P1 again' }];
  return doc;
}

describe('procedure pictures', () => {
  it('lists each picture id a document shows once', () => {
    expect(pictureIdsOf(withPictures())).toEqual([A, B]);
    expect(pictureIdsOf(fixtureProcedure())).toEqual([]);
  });

  it('names the field, check and picture of every id the shop does not have', () => {
    expect(unknownPictures(withPictures(), new Set([A, B]))).toEqual([]);
    const problems = unknownPictures(withPictures(), new Set([A]));
    expect(problems).toEqual([
      { field: 'checks[0].pictures[1].src', message: expect.stringMatching(/^Check “coil”: picture 2 \(“Where P1 sits under the seat”\) is not stored in this shop\./) },
    ]);
    expect(unknownPictures(withPictures(), new Set()).map((p) => p.field)).toEqual(['checks[0].pictures[0].src', 'checks[0].pictures[1].src', 'checks[1].pictures[0].src']);
  });

  it('accepts picture ids in a document and refuses anything else as src', () => {
    expect(parseProcedureDocument(JSON.parse(JSON.stringify(withPictures()))).ok).toBe(true);
    const doc = JSON.parse(JSON.stringify(withPictures()));
    doc.checks[0].pictures[0].src = '../photos/secret.jpg';
    const parsed = parseProcedureDocument(doc);
    expect(parsed.ok).toBe(false);
    expect(!parsed.ok && parsed.errors).toContain('A picture is the id of a picture uploaded to this shop.');
  });

  it('serves a picture under a path that cannot leave the pictures route', () => {
    expect(procedurePicturePath(A)).toBe(`/api/procedure-pictures/${A}`);
    expect(procedurePicturePath('../photos/x')).toBe('/api/procedure-pictures/..%2Fphotos%2Fx');
  });
});
