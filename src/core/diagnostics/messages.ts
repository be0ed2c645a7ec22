// Every message the tool can say, each with a stable code, in one table, so
// wording is reviewed in one place and codes never change meaning.
// 1xxx: the specification as read; 2xxx: findings of the rules.

export const MESSAGES = {
  // Reading and schema
  fileMissing: { code: 1001, text: 'No file at {path}.' },
  fileIsDirectory: { code: 1002, text: '{path} is a directory; give the specification file inside it.' },
  fileEmpty: { code: 1003, text: '{path} is empty; a specification needs at least spec_version, name, box, axle, wheels, pole, yoke, floor_straps, crew, team and operation.' },
  fileUnreadable: { code: 1004, text: 'Cannot read {path}: {reason}.' },
  fileKind: { code: 1005, text: '{path}: a specification is a .yaml, .yml, .json or .xlsx (fill-in workbook) file.' },
  syntax: { code: 1010, text: 'The file is not valid {format}: {reason}.' },
  notAnObject: { code: 1011, text: 'The specification must be a mapping of keys to values at the top level.' },
  unitString: { code: 1020, text: '{reason}; allowed: a number in {unit}, or a string such as "{example}".' },
  notFinite: { code: 1021, text: 'the value is {value}; allowed: a finite number.' },
  required: { code: 1030, text: 'the required key {key} is missing.' },
  unknownKey: { code: 1031, text: 'unknown key {key}; allowed keys here: {allowed}.' },
  wrongType: { code: 1032, text: 'the value {value} is of the wrong type; allowed: {allowed}.' },
  outOfRange: { code: 1033, text: 'the value {value} is out of range; allowed: {allowed}.' },
  notInList: { code: 1034, text: 'the value {value} is not allowed; allowed: {allowed}.' },
  badText: { code: 1035, text: 'the value {value} is not allowed; {allowed}.' },
  tooMany: { code: 1036, text: 'the list has the wrong number of entries; allowed: {allowed}.' },
  // Reading a specification workbook (104x)
  sheetMissing: { code: 1040, text: 'the workbook has no sheet "{sheet}" ({what}); every section sheet must be there, left blank where a section is not used.' },
  sheetExtra: { code: 1041, text: 'the sheet "{sheet}" is not part of a specification workbook; allowed sheets: {allowed}. Remove it, or give a renamed section sheet its name back.' },
  rowUnknown: { code: 1042, text: 'the key column holds "{key}", which is not a key of this sheet; allowed keys here: {allowed}.' },
  rowTwice: { code: 1043, text: 'the key "{key}" has two rows (also at {other}); keep one.' },
  notAWorkbook: { code: 1044, text: 'Cannot read {path} as an .xlsx workbook: {reason}.' },
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
  strapPitch: { code: 1124, text: 'the strap pitch {value} mm is less than the strap width {min} mm; the straps would overlap.' },
  marginTooWide: { code: 1125, text: 'the usable margin {value} mm leaves no usable floor; allowed: less than {max} mm (half the floor depth and width).' },
  poleRootOutsideBox: { code: 1126, text: 'the pole {key} at {value} mm is not under the box; allowed: {min} to {max} mm.' },
  loadOffVehicle: { code: 1123, text: 'the load "{value}" at x = {x} mm is not on the chariot; allowed: {min} to {max} mm.' },
  // Stock instances for `axletree stock` (12xx)
  stockInstanceEmpty: { code: 1200, text: '{path} is empty; a stock instance needs kerf_mm, stock and pieces.' },
  stockLengthTwice: { code: 1201, text: 'the stock length {value} mm is listed twice (also at {other}); list each length once.' },
  stockCostMissing: { code: 1202, text: 'this stock has no cost, but {other} has one; give a cost for every stock length or for none.' },
  pieceTooLong: { code: 1203, text: 'the piece of {value} mm is longer than every stock length (the longest is {max} mm); list longer stock or join the piece from shorter ones.' },
  pieceNoStockLeft: { code: 1204, text: 'the piece of {value} mm fits only stock of {lengths} mm, and none of it is available.' },
  stockShortLength: { code: 1205, text: 'not enough stock available: the {count} pieces of {value} mm or longer need {need} mm of stock with their kerfs, but the available stock that holds them totals {have} mm.' },
  stockShortCount: { code: 1206, text: 'not enough stock available: there are {count} pieces of {value} mm or longer, but the available stock that holds them can yield at most {have} of them.' },
  stockShortPlan: { code: 1207, text: 'not enough stock available: {reason}.' },
  // Findings (2xxx); rules fill the parameters.
  yokeLifts: { code: 2001, text: 'The yoke lifts off the horses in the case "{case}": the pole pulls up with {value} N.' },
  yokePresses: { code: 2002, text: 'The yoke presses down in every load case; least pole load {value} N ({case}).' },
  horseLoadOver: { code: 2011, text: 'Each horse carries {value} N on the yoke in "{case}", {pct} % of its body weight; the {level} limit is {limitPct} %.' },
  horseLoadWithin: { code: 2012, text: 'Each horse carries at most {value} N on the yoke ({case}), {pct} % of its body weight, within the advisory {limitPct} %.' },
  balanceNote: { code: 2021, text: 'The loaded centre of mass stands {value} mm {side} the axle; moving the axle 50 mm forward changes the static pole load by {fwd} N, 50 mm back by {back} N.' },
  // Turning (26xx)
  turnTooTight: { code: 2601, text: 'The planned turn of {radius} m is too tight: the yoke path must be wider than the pole reach of {reach} m, or the chariot cannot follow it.' },
  turnReachOk: { code: 2602, text: 'The planned turn of {radius} m is wider than the pole reach of {reach} m.' },
  innerWheelBackward: { code: 2611, text: 'In the planned turn the inner wheel runs backwards (path radius {inner} m; outer {outer} m; speed ratio {ratio}): it scrubs sideways instead of rolling.' },
  innerWheelForward: { code: 2612, text: 'In the planned turn both wheels roll forward: inner path {inner} m, outer {outer} m, speed ratio {ratio}.' },
  rolloverOver: { code: 2621, text: 'The design turn needs {value} m/s² of lateral acceleration, {pct} % of the rollover threshold; the {level} limit is {limitPct} %. The tightest turn at this speed is {tightest} m; this turn is within the advisory limit up to {speed} km/h.' },
  rolloverWithin: { code: 2622, text: 'The design turn needs {value} m/s² of lateral acceleration, {pct} % of the rollover threshold, within the advisory {limitPct} %. The tightest turn at this speed is {tightest} m; this turn stays within the advisory limit up to {speed} km/h.' },
  slideOver: { code: 2631, text: 'The design turn needs {value} m/s² sideways on {ground} (mu = {mu}), above the {level} limit of {limit} m/s²; {order}.' },
  slideWithin: { code: 2632, text: 'The design turn needs {value} m/s² sideways on {ground} (mu = {mu}), within the advisory limit of {limit} m/s²; {order}.' },
  innerWheelLight: { code: 2641, text: 'In the design turn the inner wheel keeps only {share} % of its static load ({inner} N; outer {outer} N): it is close to lifting.' },
  innerWheelLifts: { code: 2643, text: 'In the design turn the inner wheel lifts: the load transfer leaves it {inner} N ({share} % of static; outer {outer} N).' },
  wheelLoads: { code: 2642, text: 'In the design turn the outer wheel carries {outer} N and the inner {inner} N ({share} % of static); lateral forces {outerLat} N and {innerLat} N.' },
  // Strap floor (22xx)
  floorTensionOver: { code: 2201, text: 'The largest strap tension in "{case}" is {tension} N, a stress of {value} MPa at {where}: {pct} % of the design strength {strength} MPa; the {level} limit is {limitPct} %.' },
  floorTensionWithin: { code: 2202, text: 'The largest strap tension in "{case}" is {tension} N, a stress of {value} MPa at {where}: {pct} % of the design strength {strength} MPa.' },
  floorNotSolved: { code: 2203, text: 'The floor model did not settle in "{case}" ({reason}), so its tensions and sags cannot be trusted; see floor.convergence.' },
  floorSagOver: { code: 2211, text: '{role} sags the floor {value} mm standing, more than the advisory {limit} mm.' },
  floorSagWithin: { code: 2212, text: '{role} sags the floor {value} mm standing, within the advisory {limit} mm.' },
  floorStrikes: { code: 2213, text: 'The floor sags {value} mm over the {part} in "{case}" and reaches it: the {part}\'s top is {limit} mm below the floor top.' },
  floorClears: { code: 2214, text: 'The floor sags at most {value} mm over the {part} ({case}), clear of its top {limit} mm below the floor top.' },
  floorConverged: { code: 2221, text: 'The floor model settled in "{case}" in {iterations} Newton steps: largest out-of-balance force {value} N, tolerance {limit} N.' },
  floorNotConverged: { code: 2222, text: 'The floor model did not settle in "{case}": after {iterations} Newton steps the largest out-of-balance force is {value} N against the tolerance {limit} N ({reason}).' },
  floorStiffnessNote: { code: 2231, text: 'Under {role} ({load} N standing) the floor sags {sag} mm: secant stiffness {value} N/mm, tangent stiffness {tangent} N/mm.' },
  // Timber members (23xx)
  memberWithin: { code: 2301, text: '{part}, {mode}: {value} {unit}, within the design capacity {limit} {unit}; governing case "{case}" ({basis}), utilisation {util}.' },
  memberOver: { code: 2302, text: '{part}, {mode}: {value} {unit} exceeds the design capacity {limit} {unit} in "{case}" ({basis}); utilisation {util}.' },
  memberNotChecked: { code: 2303, text: '{part}: not checked: {reason}.' },
  // Steam bends (24xx)
  bendWithin: { code: 2401, text: '{part}: bend radius over thickness {value} ({radius} mm / {thickness} mm) is not below the {species} limit {limit} {strap}.' },
  bendTight: { code: 2402, text: '{part}: bend radius over thickness {value} ({radius} mm / {thickness} mm) is below the {species} limit {limit} {strap}: expect the outer face to break or the inner face to buckle.' },
  bendNoData: { code: 2403, text: '{part}: no steam-bending figure is held for {species} {strap}; the ratio {value} ({radius} mm / {thickness} mm) cannot be confirmed.' },
  // Lashings (25xx)
  lashingTensionWithin: { code: 2501, text: 'The {joint} lashing carries at most {value} N ({case}); its tensile capacity at the {state} strength is {limit} N.' },
  lashingTensionOver: { code: 2502, text: 'The {joint} lashing would carry {value} N ({case}), more than its tensile capacity of {limit} N at the {state} strength with a safety factor of {sf}.' },
  lashingDemandUnknown: { code: 2503, text: 'The force on the {joint} lashing could not be found: {why}. It is not checked.' },
  lashingSlipWithin: { code: 2511, text: 'The {joint} lashing clamps with {limit} N of friction against at most {value} N of sliding force ({case}), with the builder\'s estimated pretension of {pre} N per wrap.' },
  lashingSlipOver: { code: 2512, text: 'The {joint} joint may slip: {value} N of sliding force ({case}) against the {level} limit of {limit} N of clamp friction, with the builder\'s estimated pretension of {pre} N per wrap.' },
  anchorageWithin: { code: 2521, text: 'Each end of the {joint} lashing needs {value} full turns round a member before it is tucked; {limit} are given.' },
  anchorageShort: { code: 2522, text: 'Each end of the {joint} lashing needs {value} full turns round a member before it is tucked to hold the strap\'s breaking pull; only {limit} are given.' },
  anchorageNote: { code: 2523, text: 'Each end of the {joint} lashing needs at least {value} full turns round a member before it is tucked to hold the strap\'s breaking pull of {pull} N; give anchor_turns to have it checked.' },
  lashingPresent: { code: 2531, text: 'The {joint} joint is lashed: {wraps} wraps of {material}, {size} mm.' },
  lashingMissing: { code: 2532, text: 'The {joint} joint is not lashed, but {why}; it must pass {value} ({case}).' },
  lashingAdvised: { code: 2533, text: 'No lashing is given for the {joint} joint; {why}. Whatever holds it, lashing or joinery, must pass {value} ({case}); this check cannot see joinery.' },
  // Ride (28xx)
  rideCrewStays: { code: 2801, text: '{role} stays on the floor over the {case}: off it {value} ms in all (limit {limit} ms), at most {lift} mm above it (limit {liftLimit} mm); peak floor force {dlf} × their weight.' },
  rideCrewLeaves: { code: 2802, text: '{role} leaves the floor over the {case}: off it {value} ms in all (limit {limit} ms), at most {lift} mm above it (limit {liftLimit} mm); peak floor force {dlf} × their weight on landing.' },
  rideNotComputed: { code: 2803, text: 'The ride model could not be run for the {case}: {why}.' },
  rideDecayWithin: { code: 2811, text: 'After the drop test the crew\'s motion falls below {fraction} % of its first amplitude in {value} cycles (limit {limit}); floor damping ratio {zeta} ({zetaSource}).' },
  rideDecaySlow: { code: 2812, text: 'After the drop test the crew\'s motion takes {value} cycles to fall below {fraction} % of its first amplitude, more than {limit}; floor damping ratio {zeta} ({zetaSource}); {needed}.' },
  rideYokeHolds: { code: 2821, text: 'Over the {case} the yoke force stays between {value} N and {max} N (standing {static} N): the pole never pulls the yoke up on the necks.' },
  rideYokeLifts: { code: 2822, text: 'Over the {case} the yoke force falls to {value} N (standing {static} N, peak {max} N): the pole pulls the yoke up on the necks.' },
  // Stock and cutting (27xx)
  stockNoSpecies: { code: 2701, text: 'No {species} stock is listed, so {parts} cannot be planned: buy {buy}.' },
  stockNoSection: { code: 2702, text: '{part}: {reason}; buy {buy}.' },
  stockTooLong: { code: 2703, text: '{part}: {reason}; buy {buy}.' },
  stockAllServed: { code: 2704, text: 'Every part of the cut list is cut from the listed stock ({groups} groups by species and section).' },
  stockPlanGroup: { code: 2711, text: '{species} {section} mm: buy {bought}{cost}; {cuts} cut, {waste} % waste; {proof}.{note}' },
  bentBlanks: { code: 2721, text: '{part}: cut {blanks} blank{plural} ({quantity} + {spares} spare at {good} % good bends), {size} mm rough, from straight-grained {species} free of knots and run-out.' },
  sidingNotListed: { code: 2731, text: 'The siding is given only as a mass ({mass} kg), so its parts are not in the cut list or the stock plan.' },
  sidingExtraParts: { code: 2732, text: 'The siding is given as a mass ({mass} kg); the {parts} under stock.extra_parts {are} in the cut list and the stock plan.' },
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

/** Fill a message's {placeholders}; an unfilled one is a bug and shows as such. */
export function say(key: MessageKey, params: Record<string, string | number> = {}): { code: number; text: string } {
  const m = MESSAGES[key];
  const text = m.text.replace(/\{(\w+)\}/g, (_, name: string) =>
    name in params ? String(params[name]) : `{${name}?}`,
  );
  return { code: m.code, text };
}
