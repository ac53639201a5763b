/**
 * Cautions shared by the demo procedures, in the shop's words. The demo shop, its machines and every value in
 * its procedures are invented for the demo; the safety practice itself is common trade practice.
 */
export const CAUTION = {
  manualFirst:
    "The manufacturer's service manual, local codes and licensed practice come first. The windows in this procedure are the shop's own model data: check them against the manual for the machine on the bench.",
  highVoltage:
    'Ignition secondary voltage reaches tens of kilovolts: use a spark tester, and never hold a plug lead, plug cap or coil while the engine turns.',
  fuelVapour:
    'No spark test near fuel vapour: fuel tap off, plugs out and the plug holes covered, spilled fuel wiped up, door open.',
  hydrogen:
    'Batteries give off hydrogen: no sparks, flames or smoking near the battery and keep the bay ventilated. Battery negative off first, on last.',
  cranking:
    'Cranking moves the engine, chain and rear wheel: neutral, on the stand, hands and meter leads clear. Crank in bursts of 5 s at most with 10 s rests.',
  ignitionOffUnplug: 'Ignition off before unplugging or plugging in the control unit or any connector on it.',
  powerOffOhms:
    'Remove power before resistance or diode tests: ignition off and battery negative off. A live circuit gives false readings and can blow the meter fuse.',
  ammeterSeries:
    'Never put the meter on amps across the battery or any other voltage source: amps are read in series only, through the amps jack.',
  noCrankInSeries:
    "Don't switch the ignition on or press the starter while the meter is in series: the load will blow the meter's fuse.",
  running:
    'Running engine: exhaust and engine cases get hot. Run it outdoors or on the extraction hose, and keep leads clear of the fan, belt and chain.',
  atvParked: 'ATV: transmission in neutral or park, parking brake on, nobody on the machine while it runs or cranks.',
  scooterStand:
    'Scooter: on the centre stand with the rear wheel clear of the floor; the automatic clutch can drive the wheel as soon as the engine turns.',
  fusedJumper: 'Use fused jumper leads (5 A) to power a part on the bench; never bridge relay main terminals with the meter.',
  unloadedAc: 'The unloaded stator makes 50–80 V AC at speed: hold the probes by their shrouds and keep fingers off the terminals.',
} as const;
