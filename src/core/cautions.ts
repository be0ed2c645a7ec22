// Carried at the top of every report and workbook: people stand in these
// vehicles behind live horses.
export const CAUTIONS: readonly string[] = [
  'This is a planning aid, not a certification. Its figures come from simplified models and from material values that vary from piece to piece; several values are marked "from memory" and must be confirmed.',
  'Have the finished build inspected by a competent person (an experienced wheelwright or vehicle builder) before anyone stands in it, and again after any repair.',
  'Follow local codes, event rules and equine-welfare advice; confirm the load on the horses with an equine professional, and trial the vehicle at a walk, without crew, before driving it with people aboard.',
];

export const SHORT_CAUTION = 'Planning aid, not a certification: have the build inspected by a competent person; follow local codes, event rules and equine-welfare advice.';
