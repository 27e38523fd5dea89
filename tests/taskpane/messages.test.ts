/** Core messages re-worded for the pane: the internal path gives way to the name the user sees. */
import { SunpaneError } from '../../src/core/common/errors';
import { inUserWords, withoutPath } from '../../src/taskpane/messages';

describe('messages in the user’s words', () => {
  test('the path of the refused argument becomes the box’s label', () => {
    const err = new SunpaneError('glazing.shgc', 1.4, 'must be a number from 0 to 1');
    expect(inUserWords(err.message, 'SHGC at normal incidence')).toBe('SHGC at normal incidence: 1.4 is not allowed: must be a number from 0 to 1');
    expect(withoutPath(err.message)).toBe('1.4 is not allowed: must be a number from 0 to 1');
  });

  test('an item of a list is named by its place, counting from 1', () => {
    const err = new SunpaneError('weather.linkeTurbidity[5]', 30, 'must be a number from 1 to 10');
    expect(inUserWords(err.message, 'Linke turbidity')).toBe('Linke turbidity, value 6: 30 is not allowed: must be a number from 1 to 10');
  });

  test('a blank and a text value keep the core’s rendering; a message without a path stays as it is', () => {
    expect(inUserWords(new SunpaneError('width', null, 'must be a number above 0').message, 'Width')).toBe('Width: blank is not allowed: must be a number above 0');
    expect(inUserWords(new SunpaneError('site.latitude', 'north', 'must be a number').message, 'Latitude')).toBe('Latitude: "north" is not allowed: must be a number');
    expect(inUserWords('The table is empty.', 'X')).toBe('The table is empty.');
  });
});
