// The messages of reading and the commands, each with a stable code, in one table, so
// wording is reviewed in one place and codes never change meaning.
// 1xxx: the specification as read; 29xx: the floor-test record. Each rule
// holds its own findings' templates (2xxx) beside its code.
import { echo, escapeControls } from './echo.ts';

export const MESSAGES = {
  // Reading and schema
  fileMissing: { code: 1001, text: 'No file at {path}.' },
  fileIsDirectory: { code: 1002, text: '{path} is a directory; give the specification file inside it.' },
  fileEmpty: { code: 1003, text: '{path} is empty; a specification needs at least spec_version, name, box, axle, wheels, pole, yoke, floor_straps, crew, team and operation.' },
  fileUnreadable: { code: 1004, text: 'Cannot read {path}: {reason}.' },
  fileKind: { code: 1005, text: '{path}: a specification is a .yaml, .yml, .json or .xlsx (fill-in workbook) file.' },
  fileNotRegular: { code: 1006, text: '{path} is {kind}, not a regular file; give a file saved on disk (a pipe or device is not read, so the command never waits on one).' },
  fileEncoding: { code: 1008, text: '{path} is not UTF-8 text ({reason}); save it with the UTF-8 encoding.' },
  fileTooBig: { code: 1007, text: '{path} is {size}; {what} may be at most {max} (the limit on file size; a full specification is a few kilobytes).' },
  syntax: { code: 1010, text: 'The file is not valid {format}: {reason}.' },
  jsonComment: { code: 1012, text: 'JSON has no comments; use YAML (a .yaml file takes the same content and # comments), or remove the comment that starts here: {found}.' },
  jsonNotFinite: { code: 1013, text: '{found} is not a number JSON can hold; allowed: a finite number such as 12.5.' },
  tooManyEntries: { code: 1014, text: 'the file holds more than {max} entries (keys, values and list items: the limit on entries); a full specification holds a few hundred.' },
  tooDeep: { code: 1018, text: 'the brackets here open more than {max} lists or mappings inside one another (the limit on nesting); a specification nests a few levels.' },
  yamlAliasCount: { code: 1015, text: 'the alias *{name} is one more than the {max} aliases a file may hold (the limit on aliases); write the values out instead.' },
  yamlAliasExpansion: { code: 1019, text: 'the alias *{name} expands the file to more than {max} entries (the limit on entries, an aliased value counted each time it is used); write the values out instead.' },
  yamlAliasSelf: { code: 1016, text: 'the alias *{name} stands inside the very node its anchor &{name} names, so its value would never end; point it at another node or write the value out.' },
  yamlAliasUnresolved: { code: 1017, text: 'the alias *{name} has no anchor &{name} before it; set the anchor on a value above the alias, or write the value out.' },
  notAnObject: { code: 1011, text: 'The specification must be a mapping of keys to values at the top level.' },
  unitString: { code: 1020, text: '{reason}; allowed: a number in {unit}, or a string such as "{example}".' },
  notFinite: { code: 1021, text: 'the value is {value}; allowed: a finite number.' },
  controlCharacter: { code: 1023, text: 'the text {value} holds the control character {which}; allowed: printable text, tabs and line breaks.' },
  unitStringLong: { code: 1022, text: 'the value {value} is too long to be a number with its unit; allowed: a number in {unit}, or a number and unit of at most {max} characters (the limit on unit strings), such as "{example}".' },
  required: { code: 1030, text: 'the required key {key} is missing.' },
  unknownKey: { code: 1031, text: 'unknown key {key}; allowed keys here: {allowed}.' },
  wrongType: { code: 1032, text: 'the value {value} is of the wrong type; allowed: {allowed}.' },
  outOfRange: { code: 1033, text: 'the value {value} is out of range; allowed: {allowed}.' },
  notInList: { code: 1034, text: 'the value {value} is not allowed; allowed: {allowed}.' },
  badText: { code: 1035, text: 'the value {value} is not allowed; {allowed}.' },
  tooMany: { code: 1036, text: 'the list has {count} entries; allowed: {allowed}.' },
  // Reading a specification workbook (104x)
  sheetMissing: { code: 1040, text: 'the workbook has no sheet "{sheet}" ({what}); every section sheet must be there, left blank where a section is not used.' },
  sheetExtra: { code: 1041, text: 'the sheet "{sheet}" is not part of a specification workbook; allowed sheets: {allowed}. Remove it, or give a renamed section sheet its name back.' },
  rowUnknown: { code: 1042, text: 'the key column holds "{key}", which is not a key of this sheet; allowed keys here: {allowed}.' },
  rowTwice: { code: 1043, text: 'the key "{key}" has two rows (also at {other}); keep one.' },
  notAWorkbook: { code: 1044, text: 'Cannot read {path} as an .xlsx workbook: {reason}.' },
  workbookParts: { code: 1045, text: '{path} holds {count} parts in its zip container; a workbook may hold at most {max} (the limit on workbook parts).' },
  workbookUnpacked: { code: 1046, text: '{path} unpacks to more than {max} (the limit on a workbook\'s unpacked size){where}; a filled workbook unpacks to under a megabyte.' },
  sheetTooBig: { code: 1047, text: 'the sheet "{sheet}" reaches {reach}; a sheet may reach at most row {rows} and column {columns} (the limit on sheet size). Clear the cells beyond the specification\'s own rows.' },
  rangesTooBig: { code: 1049, text: '{path}: {what} covers {count} cells; merged cells, data validations and named ranges may cover at most {max} cells in all (the limit on ranges: each covered cell is stored one by one). Apply it to the rows in use only.' },
  workbookCells: { code: 1048, text: '{path} holds more than {max} cells (the limit on cells in all sheets); a filled workbook holds a few thousand.' },
  // Cross-field checks
  unknownSpecies: { code: 1101, text: 'unknown species "{value}"; known species: {allowed}.' },
  unknownLeather: { code: 1102, text: 'unknown material "{value}"; known materials: {allowed}.' },
  unknownGround: { code: 1103, text: 'unknown ground "{value}"; known grounds: {allowed}.' },
  axleOutsideFloor: { code: 1110, text: 'the axle at x = {value} mm is outside the floor; allowed: 0 to {max} mm (the floor depth).' },
  crewOffFloor: { code: 1111, text: '{who} at {axis} = {value} mm stands off the floor; allowed: {min} to {max} mm.' },
  yokeBehindBox: { code: 1112, text: 'the yoke at x = {value} mm is not ahead of the box; allowed: more than {min} mm (the front of the floor).' },
  poleOrder: { code: 1113, text: 'the pole must run rear_x_mm <= root_x_mm < yoke_x_mm; here {rear} mm, {root} mm, {yoke} mm.' },
  trackNarrow: { code: 1114, text: 'the track {value} mm is not wider than the axle bearing span {min} mm plus the nave length {nave} mm; the naves would run into the box.' },
  boreTooBig: { code: 1115, text: 'the bore {value} mm is not smaller than the nave diameter {max} mm.' },
  axleShort: { code: 1116, text: 'the axle {value} mm is shorter than the track plus one nave length ({min} mm); the naves would not be carried.' },
  duplicateRole: { code: 1117, text: 'the crew role "{value}" appears more than once; each role must be unique.' },
  duplicateJoint: { code: 1118, text: 'the joint "{value}" is lashed twice; list each joint once.' },
  floorTooLow: { code: 1119, text: 'the floor top at {value} mm is below the stack under it ({min} mm: wheel radius + half the axle + pole + frame).' },
  poleBendTight: { code: 1120, text: 'the yoke point lies inside the pole\'s bend circle: a bend of radius {value} mm cannot rise from the root to the yoke; allowed: a radius below {max} mm.' },
  wheelTooSmall: { code: 1121, text: 'the wheel has no room for spokes: radius {radius} mm less felloe depth {felloe} mm is not more than the nave radius {nave} mm.' },
  frameCornerTight: { code: 1122, text: 'the frame corner radius {value} mm is too large for the frame; allowed: at most {max} mm (the depth of the frame and half its width, on the rail centre line).' },
  // Inputs too large for the tool to work through in its time and memory (not wrong, only more than a chariot or a workshop needs).
  stockTooManyPieces: { code: 1240, text: 'the pieces to cut total {count}; allowed: at most {max} in one plan (plan the job in parts).' },
  strapPitchWide: { code: 1241, text: 'the strap pitch {value} mm leaves no strap across the floor ({span} mm {across}); allowed: less than {max} mm.' },
  strapPitch: { code: 1124, text: 'the strap pitch {value} mm is less than the strap width {min} mm; the straps would overlap.' },
  marginTooWide: { code: 1125, text: 'the usable margin {value} mm leaves no usable floor; allowed: less than {max} mm (half the floor depth and width).' },
  poleRootOutsideBox: { code: 1126, text: 'the pole {key} at {value} mm is not under the box; allowed: {min} to {max} mm.' },
  loadOffVehicle: { code: 1123, text: 'the load "{value}" at x = {x} mm is not on the chariot; allowed: {min} to {max} mm.' },
  horseMassNone: { code: 1127, text: 'the team gives no horse mass; give one of: horse_mass_kg (the lightest horse weighed), horse.girth_cm with horse.body_length_cm (taped), or horse.type with horse.height_m (a preset band).' },
  horseMassTwice: { code: 1128, text: 'the horse mass is given more than one way ({ways}); give exactly one, so that no two can disagree.' },
  horseHalfWay: { code: 1129, text: '{given} is given without {missing}: {way} needs both.' },
  horseHeightOutside: { code: 1130, text: 'a height of {value} m is outside the {type} preset, which holds from {min} to {max} m; give another type, or horse.girth_cm with horse.body_length_cm, or horse_mass_kg.' },
  // The form of a section (rectangular or round) and of a tyre (115x)
  sectionBothForms: { code: 1150, text: 'both forms of the section are given ({round} and {rect}); give one: {round} alone for a round bar, or {rect} for a rectangular one.' },
  sectionNoForm: { code: 1151, text: 'the section is not given; give {rect} for a rectangular bar, or {round} alone for a round one.' },
  sectionHalfForm: { code: 1152, text: '{given} is given without {missing}: a rectangular section needs both (or give {round} alone for a round bar).' },
  tyreMaterialMissing: { code: 1153, text: 'a rawhide tyre names its leather: give material (known materials: {allowed}).' },
  tyreMaterialOnIron: { code: 1154, text: 'an iron tyre takes no material (its mass comes from the density of iron); remove material, or set kind to rawhide for a hide tyre.' },
  tyreSizeMissing: { code: 1155, text: 'a {kind} tyre needs its {key}.' },
  tyreNoneWithKeys: { code: 1156, text: 'a tyre of kind none takes no other key; remove {keys}, or set kind to rawhide or iron.' },
  // Stock instances for `axletree stock` (12xx)
  stockInstanceEmpty: { code: 1200, text: '{path} is empty; a stock instance needs kerf_mm, stock and pieces.' },
  stockLengthTwice: { code: 1201, text: 'the stock length {value} mm is listed twice (also at {other}); list each length once.' },
  stockCostMissing: { code: 1202, text: 'this stock has no cost, but {other} has one; give a cost for every stock length or for none.' },
  pieceTooLong: { code: 1203, text: 'the piece of {value} mm is longer than every stock length (the longest is {max} mm); list longer stock or join the piece from shorter ones.' },
  pieceNoStockLeft: { code: 1204, text: 'the piece of {value} mm fits only stock of {lengths} mm, and none of it is available.' },
  stockShortLength: { code: 1205, text: 'not enough stock available: the {count} pieces of {value} mm or longer need {need} mm of stock with their kerfs, but the available stock that holds them totals {have} mm.' },
  stockShortCount: { code: 1206, text: 'not enough stock available: there are {count} pieces of {value} mm or longer, but the available stock that holds them can yield at most {have} of them.' },
  stockShortPlan: { code: 1207, text: 'not enough stock available: {reason}.' },
  // Floor test (29xx): `axletree floor-test`, the record as read and the estimate.
  floorCsvEmpty: { code: 2901, text: '{path} holds no header row; a floor-test record starts with a header naming time_s and displacement_mm, then one row per sample.' },
  floorCsvColumn: { code: 2902, text: 'the header has no column {column}; found: {found}.' },
  floorCsvTwice: { code: 2903, text: 'the header names {column} twice; name each column once.' },
  floorCsvFields: { code: 2904, text: 'the row has {count} fields but the header has {expected}.' },
  floorCsvNumber: { code: 2905, text: '{column} is "{value}"; allowed: a finite number.' },
  floorCsvTime: { code: 2906, text: 'time_s {value} s does not come after {previous} s on line {previousLine}; times must increase.' },
  floorCsvShort: { code: 2907, text: '{path} holds {count} samples; a floor test needs at least {min}.' },
  floorTestMass: { code: 2911, text: '--mass-kg must be a positive number of kilograms, the mass dropped on the floor (got {value}).' },
  floorTestStill: { code: 2912, text: 'the record does not move above its noise ({noise} mm); no drop is seen.' },
  floorTestFewCycles: { code: 2913, text: 'after the first peak at {time} s the record holds {count} half-cycles above the noise ({noise} mm); at least {min} are needed for a damping estimate; record for longer or with less noise.' },
  floorTestFit: { code: 2914, text: 'the damped-sine fit did not settle ({reason}); the record may not be a free vibration (a bounce, or a floor far from linear).' },
} as const;

export type MessageKey = keyof typeof MESSAGES;

/**
 * Params that carry text from the input (a value, a key, a sheet's name, the
 * text found at an error): shown escaped and cut to a few dozen characters.
 * Every other param is the tool's own words and is only escaped.
 */
const ECHOED = new Set(['value', 'key', 'sheet', 'found', 'name', 'column']);

/** Fill a template's {placeholders} from params, each shown safely (see ECHOED); `missing` answers a placeholder without a param. */
export function fill(template: string, params: Readonly<Record<string, string | number>>, missing: (name: string) => string): string {
  return template.replace(/\{(\w+)\}/g, (_, name: string) => {
    if (!Object.hasOwn(params, name)) return missing(name);
    const text = String(params[name]);
    return ECHOED.has(name) ? echo(text) : escapeControls(text);
  });
}

/** Fill a message's {placeholders}; an unfilled one is a bug and shows as such. */
export function say(key: MessageKey, params: Record<string, string | number> = {}): { code: number; text: string } {
  const m = MESSAGES[key];
  return { code: m.code, text: fill(m.text, params, (name) => `{${name}?}`) };
}
