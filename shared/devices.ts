import { filterDevices } from './device-search';
import type { LoadInput } from './schemas/projection';

// The device catalogue: typical devices with a typical draw, duty cycle and hours, to pick loads from.
// No brands. Every figure is a typical one, marked "common practice" (the figure people in the trade and on
// the road use) or "from memory" (remembered from specification sheets; check the device's own label).
// GET /api/devices serves it; tests/shared/devices.test.ts holds every entry against the load schema.

export type DeviceSource = 'common practice' | 'from memory';
export type DeviceCategory = 'Cooling' | 'Lights' | 'Fans and heating' | 'Health' | 'Phones and computers' | 'Cameras and drones' | 'Internet and entertainment' | 'Kitchen' | 'Personal care' | 'Chargers and tools' | 'Water' | 'Vehicle and other';

export type Device = {
  id: string;
  name: string;
  category: DeviceCategory;
  /** A load as the load schema takes it: supply, watts or amps, duty, hours, window, when. */
  load: LoadInput;
  source: DeviceSource;
  /** Where the figure comes from and what moves it, in a sentence. */
  note: string;
};

type Spec = { w?: number; a?: number; duty?: number; h: number; from?: number; when?: 'always' | 'parked' | 'driving' };

function d(id: string, name: string, category: DeviceCategory, supply: 'dc' | 'ac', s: Spec, source: DeviceSource, note: string): Device {
  const load: LoadInput = {
    name,
    supply,
    ...(s.a !== undefined ? { amps: s.a } : { watts: s.w ?? 0 }),
    dutyPercent: s.duty ?? 100,
    hoursPerDay: s.h,
    ...(s.from !== undefined ? { startHour: s.from } : {}),
    when: s.when ?? 'always',
    // Health devices (a CPAP) are essential: a Fix that would stop one says so.
    ...(category === 'Health' ? { essential: true } : {}),
  };
  return { id, name, category, load, source, note };
}

const CP: DeviceSource = 'common practice';
const FM: DeviceSource = 'from memory';

export const DEVICES: readonly Device[] = [
  // Cooling
  d('fridge-compressor-40l', 'Compressor fridge (40 L)', 'Cooling', 'dc', { w: 40, duty: 35, h: 24 }, CP, 'Runs about a third of each hour in mild weather; more in summer heat.'),
  d('fridge-compressor-60l', 'Compressor fridge (60 L)', 'Cooling', 'dc', { w: 50, duty: 35, h: 24 }, CP, 'A bigger cabinet, a slightly bigger compressor; duty rises with heat and door openings.'),
  d('fridge-compressor-80l', 'Compressor fridge-freezer (80 L, two zones)', 'Cooling', 'dc', { w: 60, duty: 45, h: 24 }, FM, 'A freezer zone keeps the compressor running longer.'),
  d('coolbox-compressor-25l', 'Compressor cool box (25 L)', 'Cooling', 'dc', { w: 35, duty: 30, h: 24 }, CP, 'Small portable box; about a third of the time at 4 °C in a 25 °C cabin.'),
  d('coolbox-thermoelectric', 'Thermoelectric cool box', 'Cooling', 'dc', { a: 4, duty: 100, h: 24 }, CP, 'Peltier boxes run all the time at about 4 A and never cycle off: a big drain parked.'),
  d('coolbox-thermoelectric-eco', 'Thermoelectric cool box on its low setting', 'Cooling', 'dc', { a: 2.5, duty: 100, h: 24 }, FM, 'Some boxes have an eco setting at about 2 to 3 A.'),
  d('fridge-absorption-12v', 'Absorption fridge on 12 V', 'Cooling', 'dc', { w: 120, duty: 100, h: 1, when: 'driving' }, CP, 'Three-way fridges run their heater on 12 V only while driving; on gas when parked.'),
  d('freezer-compressor-20l', 'Compressor freezer box (20 L)', 'Cooling', 'dc', { w: 45, duty: 50, h: 24 }, FM, 'Holding −18 °C keeps the compressor on about half the time.'),
  // Lights
  d('led-strip', 'LED strip lights', 'Lights', 'dc', { w: 10, h: 4, from: 18, when: 'parked' }, CP, 'About 5 W per metre of strip at full brightness.'),
  d('led-spot', 'LED ceiling spot', 'Lights', 'dc', { w: 3, h: 4, from: 18, when: 'parked' }, CP, 'Recessed 12 V spots draw 2 to 4 W each; set How many.'),
  d('led-reading-light', 'LED reading light', 'Lights', 'dc', { w: 2, h: 2, from: 21, when: 'parked' }, CP, 'A small gooseneck or bunk light.'),
  d('led-awning-light', 'LED awning light', 'Lights', 'dc', { w: 12, h: 3, from: 19, when: 'parked' }, FM, 'Outdoor strip along the awning.'),
  d('fluorescent-tube', 'Fluorescent tube light (old type)', 'Lights', 'dc', { w: 16, h: 3, from: 18, when: 'parked' }, FM, 'Older campers; an LED replacement draws about a third.'),
  d('halogen-spot', 'Halogen spot (old type)', 'Lights', 'dc', { w: 20, h: 3, from: 18, when: 'parked' }, CP, 'Halogen 12 V spots are 10 to 20 W; LEDs do the same for 2 to 3 W.'),
  d('string-lights', 'Fairy string lights (USB)', 'Lights', 'dc', { w: 3, h: 4, from: 18, when: 'parked' }, FM, 'USB string lights, through a 12 V USB socket.'),
  d('head-torch-charging', 'Head torch charging', 'Lights', 'dc', { w: 5, h: 1, from: 20 }, FM, 'A small lithium cell topped up from USB.'),
  // Fans and heating
  d('roof-fan', 'Roof vent fan', 'Fans and heating', 'dc', { w: 20, duty: 50, h: 8, from: 22, when: 'parked' }, CP, 'About 3 A on high, well under 1 A on low; half speed averages about 20 W.'),
  d('roof-fan-night-low', 'Roof vent fan on low all night', 'Fans and heating', 'dc', { w: 8, h: 9, from: 22, when: 'parked' }, FM, 'Low speed for sleeping.'),
  d('clip-fan', '12 V clip-on fan', 'Fans and heating', 'dc', { w: 10, h: 6, from: 13, when: 'parked' }, CP, 'Small desk or clip fans draw 5 to 15 W.'),
  d('usb-fan', 'USB fan', 'Fans and heating', 'dc', { w: 4, h: 6, from: 22, when: 'parked' }, FM, 'Small USB fans draw 2 to 5 W.'),
  d('diesel-heater-running', 'Diesel heater (fan and pump, running)', 'Fans and heating', 'dc', { a: 1, h: 6, from: 22, when: 'parked' }, CP, 'A 2 kW air heater draws about 0.8 to 1.5 A once lit, more on high.'),
  d('diesel-heater-glow', 'Diesel heater start-up glow plug', 'Fans and heating', 'dc', { a: 9, h: 0.1, from: 22, when: 'parked' }, CP, 'The glow plug draws 8 to 10 A for the first few minutes of each start; add one per start.'),
  d('diesel-heater-5kw', 'Diesel heater (5 kW, running)', 'Fans and heating', 'dc', { a: 2, h: 5, from: 22, when: 'parked' }, FM, 'A larger heater moves more air and draws more.'),
  d('gas-heater-fan', 'Gas heater blower fan', 'Fans and heating', 'dc', { a: 1.5, duty: 60, h: 6, from: 18, when: 'parked' }, FM, 'Blown-air gas heaters run their fan while the burner cycles.'),
  d('electric-blanket-12v', '12 V heated blanket', 'Fans and heating', 'dc', { w: 45, duty: 50, h: 2, from: 22, when: 'parked' }, FM, 'Thermostat cycles on and off; best used to pre-warm the bed.'),
  d('heated-seat-pad', '12 V heated seat pad', 'Fans and heating', 'dc', { w: 40, h: 1, when: 'driving' }, FM, 'Usually only worth running while driving.'),
  d('fan-heater-ac', 'Fan heater on the inverter', 'Fans and heating', 'ac', { w: 1000, h: 0.5, from: 7, when: 'parked' }, CP, 'Resistive heat from a battery is very costly: 1 kW is over 90 A at 12 V.'),
  // Health
  d('cpap-no-humidifier', 'CPAP machine, humidifier off', 'Health', 'dc', { w: 30, h: 8, from: 23, when: 'parked' }, CP, 'Through a 12 V converter without the heated humidifier: about 25 to 40 W.'),
  d('cpap-humidifier', 'CPAP machine with heated humidifier', 'Health', 'dc', { w: 70, h: 8, from: 23, when: 'parked' }, CP, 'The humidifier heater roughly doubles or triples the draw.'),
  d('cpap-on-inverter', 'CPAP machine on the inverter', 'Health', 'ac', { w: 40, h: 8, from: 23, when: 'parked' }, FM, 'The mains supply adds its own losses; a 12 V converter saves the inverter idle draw.'),
  d('oxygen-concentrator', 'Portable oxygen concentrator', 'Health', 'dc', { w: 90, h: 8, from: 23, when: 'parked' }, FM, 'Varies a lot with the flow setting; check the device label.'),
  d('insulin-cooler', 'Medication cooler', 'Health', 'dc', { w: 15, duty: 40, h: 24 }, FM, 'Small insulated case with its own cooler.'),
  d('nebuliser', 'Nebuliser', 'Health', 'ac', { w: 60, h: 0.5, from: 8, when: 'parked' }, FM, 'Compressor nebulisers for short sessions.'),
  // Phones and computers
  d('phone-charging', 'Phone charging', 'Phones and computers', 'dc', { w: 10, h: 2, from: 21 }, CP, 'A phone battery holds 12 to 20 Wh; charging at 10 W for about 2 h fills it.'),
  d('phone-fast-charging', 'Phone fast charging', 'Phones and computers', 'dc', { w: 20, h: 1, from: 21 }, FM, 'Fast chargers take the same energy in half the time.'),
  d('tablet-charging', 'Tablet charging', 'Phones and computers', 'dc', { w: 15, h: 3, from: 20 }, CP, 'A tablet holds 25 to 40 Wh.'),
  d('laptop-ac', 'Laptop on the inverter', 'Phones and computers', 'ac', { w: 60, duty: 70, h: 3, from: 14, when: 'parked' }, CP, 'The charger takes 45 to 90 W while charging, less once full.'),
  d('laptop-dc', 'Laptop on a 12 V USB-C charger', 'Phones and computers', 'dc', { w: 45, duty: 70, h: 3, from: 14, when: 'parked' }, CP, 'Skips the inverter and its idle draw.'),
  d('laptop-gaming', 'Gaming laptop on the inverter', 'Phones and computers', 'ac', { w: 150, duty: 70, h: 2, from: 20, when: 'parked' }, FM, 'High-power laptops draw 120 to 230 W under load.'),
  d('ereader', 'E-reader charging', 'Phones and computers', 'dc', { w: 5, h: 0.5, from: 21 }, FM, 'A week of reading on one charge.'),
  d('smartwatch', 'Smartwatch charging', 'Phones and computers', 'dc', { w: 3, h: 1, from: 21 }, FM, 'Tiny battery.'),
  d('power-bank', 'Power bank recharging', 'Phones and computers', 'dc', { w: 18, h: 2, from: 12 }, CP, 'A 20,000 mAh bank holds about 74 Wh.'),
  d('monitor', 'Computer monitor', 'Phones and computers', 'ac', { w: 25, h: 4, from: 9, when: 'parked' }, FM, 'A 24-inch LED monitor draws 15 to 30 W.'),
  d('desktop-mini', 'Mini desktop computer', 'Phones and computers', 'ac', { w: 40, duty: 80, h: 6, from: 9, when: 'parked' }, FM, 'Small-form-factor computers for remote work.'),
  d('printer', 'Small printer', 'Phones and computers', 'ac', { w: 20, h: 0.2, from: 10, when: 'parked' }, FM, 'Inkjets draw little, briefly.'),
  d('headphones', 'Headphones or earbuds charging', 'Phones and computers', 'dc', { w: 3, h: 1, from: 21 }, FM, 'Small batteries.'),
  // Cameras and drones
  d('camera-battery', 'Camera battery charging', 'Cameras and drones', 'dc', { w: 10, h: 2, from: 20 }, CP, 'Mirrorless and compact camera batteries hold 7 to 16 Wh.'),
  d('action-camera', 'Action camera charging', 'Cameras and drones', 'dc', { w: 5, h: 2, from: 20 }, FM, 'Small batteries of about 6 Wh.'),
  d('drone-charging', 'Drone battery charging', 'Cameras and drones', 'ac', { w: 65, h: 1.5, from: 18, when: 'parked' }, CP, 'A camera drone battery holds 40 to 80 Wh; its mains charger takes about 60 to 100 W.'),
  d('drone-charging-dc', 'Drone battery charging on 12 V', 'Cameras and drones', 'dc', { w: 60, h: 1.5, when: 'driving' }, FM, 'Car chargers for drone batteries, best while driving.'),
  d('dashcam-parked', 'Dash camera in parking mode', 'Cameras and drones', 'dc', { w: 3, h: 24, when: 'parked' }, FM, 'Parking mode keeps it recording; hard-wire kits cut it off at a set voltage.'),
  d('dashcam-driving', 'Dash camera while driving', 'Cameras and drones', 'dc', { w: 4, h: 24, when: 'driving' }, FM, 'Front and rear cameras draw 3 to 6 W.'),
  d('security-camera', 'Wi-Fi security camera', 'Cameras and drones', 'dc', { w: 4, h: 24 }, FM, 'Always-on indoor camera.'),
  // Internet and entertainment
  d('mobile-router', 'Mobile (4G/5G) router', 'Internet and entertainment', 'dc', { w: 10, h: 10, from: 9 }, CP, 'A cellular router with its antenna draws 6 to 12 W.'),
  d('wifi-booster', 'Wi-Fi booster', 'Internet and entertainment', 'dc', { w: 8, h: 8, from: 9 }, FM, 'Campsite Wi-Fi extenders.'),
  d('satellite-internet', 'Satellite internet dish', 'Internet and entertainment', 'ac', { w: 60, h: 6, from: 9, when: 'parked' }, CP, 'Consumer satellite dishes draw 50 to 100 W while online.'),
  d('satellite-internet-dc', 'Satellite internet dish on 12 V', 'Internet and entertainment', 'dc', { w: 45, h: 6, from: 9, when: 'parked' }, FM, 'A 12 V supply skips the inverter.'),
  d('tv-12v-22in', '12 V TV (22 inch)', 'Internet and entertainment', 'dc', { w: 25, h: 3, from: 19, when: 'parked' }, CP, 'Small 12 V LED TVs draw 20 to 30 W.'),
  d('tv-ac-32in', 'TV on the inverter (32 inch)', 'Internet and entertainment', 'ac', { w: 45, h: 3, from: 19, when: 'parked' }, CP, 'A 32-inch LED TV draws 35 to 55 W.'),
  d('streaming-stick', 'Streaming stick', 'Internet and entertainment', 'dc', { w: 5, h: 3, from: 19, when: 'parked' }, FM, 'Powered from a USB socket.'),
  d('games-console', 'Games console', 'Internet and entertainment', 'ac', { w: 120, h: 2, from: 19, when: 'parked' }, FM, 'Home consoles draw 100 to 200 W while playing.'),
  d('handheld-console', 'Handheld games console charging', 'Internet and entertainment', 'dc', { w: 15, h: 2, from: 19 }, FM, 'Charges from USB-C.'),
  d('speaker', 'Bluetooth speaker charging', 'Internet and entertainment', 'dc', { w: 8, h: 2, from: 18 }, FM, 'Small speakers.'),
  d('radio', 'Vehicle radio, parked', 'Internet and entertainment', 'dc', { w: 12, h: 2, from: 18, when: 'parked' }, FM, 'A head unit at moderate volume.'),
  d('satellite-tv', 'Satellite TV receiver', 'Internet and entertainment', 'dc', { w: 12, h: 3, from: 19, when: 'parked' }, FM, 'Set-top receiver and its dish head.'),
  d('projector', 'Small projector', 'Internet and entertainment', 'ac', { w: 80, h: 2, from: 20, when: 'parked' }, FM, 'Portable LED projectors draw 50 to 150 W.'),
  // Kitchen
  d('kettle', 'Electric kettle', 'Kitchen', 'ac', { w: 1500, h: 0.1, from: 7, when: 'parked' }, CP, 'A full-size kettle draws 1.5 to 2.2 kW: 150 A or more at 12 V, needing a large inverter.'),
  d('kettle-low-power', 'Low-power travel kettle', 'Kitchen', 'ac', { w: 800, h: 0.15, from: 7, when: 'parked' }, CP, 'Travel kettles of 600 to 1000 W take longer but suit a smaller inverter.'),
  d('kettle-12v', '12 V kettle', 'Kitchen', 'dc', { w: 150, h: 0.3, from: 7 }, FM, 'Slow: about 20 minutes for a litre.'),
  d('induction-hob', 'Induction hob (one zone)', 'Kitchen', 'ac', { w: 1200, duty: 70, h: 0.5, from: 18, when: 'parked' }, CP, 'One zone at 1 to 2 kW, cycling at lower settings.'),
  d('microwave', 'Microwave', 'Kitchen', 'ac', { w: 1100, h: 0.1, from: 12, when: 'parked' }, CP, 'A 700 W (cooking) microwave takes about 1,100 W from the supply.'),
  d('coffee-espresso', 'Espresso machine', 'Kitchen', 'ac', { w: 1300, duty: 50, h: 0.25, from: 7, when: 'parked' }, CP, 'The boiler heats at 1 to 1.5 kW, then cycles.'),
  d('coffee-capsule', 'Capsule coffee machine', 'Kitchen', 'ac', { w: 1200, h: 0.1, from: 7, when: 'parked' }, CP, 'Heats for a minute or two per cup.'),
  d('coffee-12v', '12 V portable espresso maker', 'Kitchen', 'dc', { w: 150, h: 0.15, from: 7 }, FM, 'Slow-heating cigarette-socket espresso makers.'),
  d('coffee-grinder', 'Coffee grinder', 'Kitchen', 'ac', { w: 150, h: 0.05, from: 7, when: 'parked' }, FM, 'A burr grinder runs a minute or two.'),
  d('blender', 'Blender', 'Kitchen', 'ac', { w: 400, h: 0.05, from: 8, when: 'parked' }, FM, 'Short bursts.'),
  d('toaster', 'Toaster', 'Kitchen', 'ac', { w: 900, h: 0.1, from: 8, when: 'parked' }, CP, 'Resistive: 800 to 1,000 W for a few minutes.'),
  d('rice-cooker', 'Small rice cooker', 'Kitchen', 'ac', { w: 300, duty: 60, h: 0.5, from: 18, when: 'parked' }, FM, 'Travel rice cookers of 200 to 400 W.'),
  d('air-fryer', 'Air fryer', 'Kitchen', 'ac', { w: 1400, duty: 70, h: 0.3, from: 18, when: 'parked' }, FM, 'Heats at 1.2 to 1.7 kW, then cycles.'),
  d('slow-cooker-12v', '12 V lunch box cooker', 'Kitchen', 'dc', { w: 40, h: 1, when: 'driving' }, FM, 'Heats a meal while driving.'),
  d('cool-water-dispenser', 'Water filter pump', 'Kitchen', 'dc', { w: 15, h: 0.2, from: 8 }, FM, 'Small filtered-water pumps.'),
  // Personal care
  d('hair-dryer', 'Hair dryer', 'Personal care', 'ac', { w: 1200, h: 0.1, from: 8, when: 'parked' }, CP, 'Full-size dryers draw 1.2 to 2 kW; travel ones about 1 kW.'),
  d('hair-straightener', 'Hair straightener', 'Personal care', 'ac', { w: 50, duty: 60, h: 0.3, from: 8, when: 'parked' }, FM, 'Heats up quickly, then cycles.'),
  d('electric-shaver', 'Electric shaver charging', 'Personal care', 'dc', { w: 5, h: 1, from: 20 }, FM, 'Small battery.'),
  d('electric-toothbrush', 'Electric toothbrush charging', 'Personal care', 'ac', { w: 2, h: 4, from: 21, when: 'parked' }, FM, 'Inductive chargers sip power, but on the inverter they keep it on.'),
  // Chargers and tools
  d('ebike-charger', 'E-bike battery charging', 'Chargers and tools', 'ac', { w: 150, h: 3, from: 12, when: 'parked' }, CP, 'A 500 Wh pack on a 2 to 4 A charger; about 120 to 200 W from the mains.'),
  d('escooter-charger', 'E-scooter charging', 'Chargers and tools', 'ac', { w: 80, h: 4, from: 12, when: 'parked' }, FM, 'Smaller packs of 250 to 450 Wh.'),
  d('tool-battery-charger', 'Power tool battery charger', 'Chargers and tools', 'ac', { w: 100, h: 1, from: 12, when: 'parked' }, CP, 'An 18 V 5 Ah pack (90 Wh) charges in about an hour.'),
  d('drill-corded', 'Corded drill', 'Chargers and tools', 'ac', { w: 600, h: 0.1, from: 10, when: 'parked' }, FM, 'Short use; mind the inverter rating at start-up.'),
  d('tyre-inflator', 'Tyre inflator', 'Chargers and tools', 'dc', { a: 12, h: 0.2, when: 'parked' }, CP, 'Portable compressors draw 10 to 15 A; best with the engine running.'),
  d('vacuum-12v', 'Handheld 12 V vacuum', 'Chargers and tools', 'dc', { w: 90, h: 0.1, from: 10 }, FM, 'Short use.'),
  d('vacuum-cordless-charger', 'Cordless vacuum charging', 'Chargers and tools', 'ac', { w: 30, h: 3, from: 12, when: 'parked' }, FM, 'Stick vacuum battery packs.'),
  d('sewing-machine', 'Sewing machine', 'Chargers and tools', 'ac', { w: 85, h: 1, from: 14, when: 'parked' }, FM, 'Domestic sewing machines draw 70 to 100 W.'),
  d('soldering-iron', 'Soldering iron', 'Chargers and tools', 'ac', { w: 60, duty: 50, h: 0.5, from: 14, when: 'parked' }, FM, 'A temperature-controlled iron cycles.'),
  // Water
  d('water-pump', 'Water pump', 'Water', 'dc', { a: 5, h: 0.3, from: 7 }, CP, 'A diaphragm pump draws 4 to 7 A; runs only while a tap is open (about 20 minutes a day).'),
  d('water-pump-submersible', 'Submersible water pump', 'Water', 'dc', { a: 2, h: 0.3, from: 7 }, FM, 'Small in-tank pumps of 1.5 to 3 A.'),
  d('shower-pump', 'Shower drain pump', 'Water', 'dc', { a: 3, h: 0.1, from: 7 }, FM, 'Short use after each shower.'),
  d('water-heater-12v', '12 V water heater element', 'Water', 'dc', { w: 200, h: 1, when: 'driving' }, FM, 'Only sensible while driving or from a large lithium bank.'),
  d('water-heater-ac', 'Water heater on the inverter', 'Water', 'ac', { w: 660, duty: 60, h: 0.5, from: 7, when: 'parked' }, FM, 'Small camper water heaters have 500 to 850 W elements.'),
  d('toilet-flush', 'Cassette toilet flush pump', 'Water', 'dc', { a: 2, h: 0.05, from: 7 }, FM, 'Seconds per flush.'),
  d('composting-toilet-fan', 'Composting toilet fan', 'Water', 'dc', { a: 0.15, h: 24 }, CP, 'A small fan that runs all the time, about 0.1 to 0.2 A.'),
  // Vehicle and other
  d('gas-detector', 'Gas and carbon monoxide alarm', 'Vehicle and other', 'dc', { a: 0.05, h: 24 }, CP, 'Wired 12 V alarms draw tens of milliamps, always on.'),
  d('tracker', 'Vehicle tracker', 'Vehicle and other', 'dc', { a: 0.03, h: 24 }, FM, 'Sleeps most of the time; wakes to report.'),
  d('alarm', 'Aftermarket vehicle alarm', 'Vehicle and other', 'dc', { a: 0.02, h: 24, when: 'parked' }, FM, 'Adds to the vehicle\'s own key-off draw.'),
  d('battery-monitor', 'Battery monitor with shunt', 'Vehicle and other', 'dc', { a: 0.01, h: 24 }, FM, 'A few milliamps.'),
  d('usb-socket-idle', 'USB sockets (idle)', 'Vehicle and other', 'dc', { a: 0.02, h: 24 }, FM, 'Some USB sockets draw a little even with nothing plugged in.'),
  d('step-light', 'Step light', 'Vehicle and other', 'dc', { w: 2, h: 0.5, from: 19, when: 'parked' }, FM, 'Comes on with the door.'),
  d('electric-step', 'Electric step', 'Vehicle and other', 'dc', { a: 10, h: 0.01, when: 'parked' }, FM, 'A few seconds per use.'),
  d('winch-standby', 'Winch controller standby', 'Vehicle and other', 'dc', { a: 0.05, h: 24 }, FM, 'Wireless winch remotes keep a receiver awake.'),
  d('lift-bed', 'Electric lift bed', 'Vehicle and other', 'dc', { a: 10, h: 0.02, from: 22, when: 'parked' }, FM, 'Moves for about a minute a day.'),
  d('leveling-jacks', 'Electric levelling jacks', 'Vehicle and other', 'dc', { a: 20, h: 0.02, when: 'parked' }, FM, 'A short heavy draw when setting up.'),
];

export const searchDevices = (query: string, category?: DeviceCategory, limit?: number) => filterDevices(DEVICES, query, category, limit);

export const DEVICE_CATEGORIES: readonly DeviceCategory[] = [...new Set(DEVICES.map((dev) => dev.category))];
