/**
 * Two invented soundings for the Soundings page demo (not observations, not check values).
 * The same files live in tests/fixtures/soundings/ for the CLI and reader tests.
 */

export interface DemoSounding {
  readonly id: string;
  readonly title: string;
  readonly csv: string;
}

/** A moist warm sector with winds veering and strengthening with height. */
const WARM_SECTOR = `pressure_hpa,height_m,temp_c,dewpoint_c,wind_dir_deg,wind_speed_kt
1000,110,29.0,22.0,160,15
975,335,27.0,21.0,170,25
950,565,25.0,20.0,180,33
925,799,23.2,19.0,190,38
900,1038,21.6,17.0,200,40
850,1533,18.6,14.0,210,40
800,2051,15.6,10.0,220,40
750,2596,12.4,4.0,225,42
700,3171,9.0,-2.0,230,45
650,3781,5.0,-8.0,235,48
600,4428,0.6,-14.0,240,52
550,5120,-4.2,-20.0,240,56
500,5863,-9.6,-26.0,245,60
450,6667,-15.6,-32.0,245,65
400,7544,-22.4,-38.0,250,70
350,8508,-30.2,-44.0,250,75
300,9585,-39.0,-50.0,250,80
250,10808,-48.8,-57.0,250,85
200,12250,-56.0,-64.0,255,80
150,14062,-60.0,-72.0,255,65
100,16568,-64.0,-80.0,260,45
`;

/** A hot, moist surface layer under a strong warm nose near 850 hPa, with two levels missing wind. */
const CAPPED_PLAINS = `pressure_hpa,height_m,temp_c,dewpoint_c,wind_dir_deg,wind_speed_kt
985,240,31.0,21.0,180,12
950,563,27.6,19.5,190,18
925,799,25.0,18.0,195,22
900,1039,22.8,15.0,200,22
875,1284,22.0,6.0,210,20
850,1536,24.0,0.0,220,20
800,2062,20.5,-2.0,230,24
750,2614,16.0,-4.0,235,28
700,3194,11.2,-6.0,240,30
650,3806,6.0,-9.0,,
600,4455,0.4,-13.0,245,36
550,5145,-5.6,-18.0,250,40
500,5883,-12.0,-24.0,250,45
450,6678,-18.6,-31.0,,
400,7544,-25.8,-38.0,255,55
350,8496,-33.6,-45.0,255,60
300,9557,-42.4,-52.0,260,65
250,10765,-51.0,-59.0,260,70
200,12198,-56.6,-66.0,265,62
150,14011,-59.0,-74.0,265,50
100,16529,-63.0,-82.0,270,35
`;

export const DEMO_SOUNDINGS: readonly DemoSounding[] = [
  { id: "warm-sector", title: "Demo: moist warm sector, veering winds", csv: WARM_SECTOR },
  { id: "capped-plains", title: "Demo: capped hot plains", csv: CAPPED_PLAINS },
];
