import { guessMapping } from './csv-fields';

describe('guessMapping', () => {
  it('guesses fields from everyday header names, whatever their case and punctuation', () => {
    expect(
      guessMapping(['Book Title', 'Author', 'ISBN-13', 'Status', 'Stars', 'Date started', 'Date finished', 'No. of pages', 'Shelves', 'My notes', 'Year']),
    ).toEqual(['title', 'authors', 'isbn', 'status', 'rating', 'startedOn', 'finishedOn', 'pages', 'shelves', 'review', 'year']);
  });

  it('leaves unknown columns out and guesses each field for one column only', () => {
    expect(guessMapping(['Title', 'Title', 'Colour of spine'])).toEqual(['title', null, null]);
  });
});
