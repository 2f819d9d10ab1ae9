// Column names and ground words as European telematics exports write them. The words are the
// everyday terms of each language (from memory, no source); the exports are invented.
import { describe, expect, it } from "vitest";
import { guessColumns } from "@/lib/duty-cycles/guess-mapping";
import { parseLoadState, parseReverse, parseSurface } from "@/lib/duty-cycles/surface-names";

type TCase = {
  language: string;
  headers: string[];
  surfaces: [string, string][];
  laden: string;
  reverse: string;
};

// Columns in every case: time, speed, heading, lat, lon, surface, load, gear.
const CASES: TCase[] = [
  {
    language: "German",
    headers: [
      "Zeit",
      "Geschwindigkeit (km/h)",
      "Kurs (°)",
      "Breite",
      "Länge",
      "Untergrund",
      "Beladung",
      "Fahrtrichtung",
    ],
    surfaces: [
      ["Acker", "firm-soil"],
      ["Grünland", "grass"],
      ["Schotter", "gravel"],
      ["Straße", "concrete-asphalt"],
      ["gepflügt", "loose-soil"],
    ],
    laden: "beladen",
    reverse: "Rückwärts",
  },
  {
    language: "French",
    headers: [
      "Horodatage",
      "Vitesse (km/h)",
      "Cap (°)",
      "Latitude",
      "Longitude",
      "Sol",
      "Charge",
      "Sens de marche",
    ],
    surfaces: [
      ["Champ", "firm-soil"],
      ["Prairie", "grass"],
      ["Gravier", "gravel"],
      ["Route", "concrete-asphalt"],
      ["Labouré", "loose-soil"],
    ],
    laden: "chargé",
    reverse: "Arrière",
  },
  {
    language: "Spanish",
    headers: [
      "Tiempo",
      "Velocidad (km/h)",
      "Rumbo (°)",
      "Latitud",
      "Longitud",
      "Superficie",
      "Carga",
      "Marcha",
    ],
    surfaces: [
      ["Campo", "firm-soil"],
      ["Césped", "grass"],
      ["Grava", "gravel"],
      ["Carretera", "concrete-asphalt"],
      ["Arado", "loose-soil"],
    ],
    laden: "cargado",
    reverse: "Atrás",
  },
  {
    language: "Italian",
    headers: [
      "Ora",
      "Velocità (km/h)",
      "Rotta (°)",
      "Latitudine",
      "Longitudine",
      "Terreno",
      "Carico",
      "Marcia",
    ],
    surfaces: [
      ["Campo", "firm-soil"],
      ["Prato", "grass"],
      ["Ghiaia", "gravel"],
      ["Strada", "concrete-asphalt"],
      ["Arato", "loose-soil"],
    ],
    laden: "carico",
    reverse: "Indietro",
  },
  {
    language: "Dutch",
    headers: [
      "Tijdstip",
      "Snelheid (km/h)",
      "Koers (°)",
      "Breedtegraad",
      "Lengtegraad",
      "Ondergrond",
      "Lading",
      "Rijrichting",
    ],
    surfaces: [
      ["Akker", "firm-soil"],
      ["Grasland", "grass"],
      ["Grind", "gravel"],
      ["Asfalt", "concrete-asphalt"],
      ["Geploegd", "loose-soil"],
    ],
    laden: "geladen",
    reverse: "Achteruit",
  },
  {
    language: "Polish",
    headers: [
      "Czas",
      "Prędkość (km/h)",
      "Kurs (°)",
      "Szerokość geograficzna",
      "Długość geograficzna",
      "Podłoże",
      "Ładunek",
      "Kierunek jazdy",
    ],
    surfaces: [
      ["Pole", "firm-soil"],
      ["Łąka", "grass"],
      ["Żwir", "gravel"],
      ["Droga", "concrete-asphalt"],
      ["Zaorane", "loose-soil"],
    ],
    laden: "załadowany",
    reverse: "Wstecz",
  },
];

describe("header guesses and ground words in six European languages", () => {
  for (const c of CASES) {
    it(`guesses every column of a ${c.language} export`, () => {
      const columns = guessColumns("telematics", c.headers, [
        "0",
        "7,2",
        "90",
        "52,1",
        "9,3",
        "x",
        "x",
        "x",
      ]);
      expect(columns).toMatchObject({
        time: { index: 0 },
        speed: { index: 1, unit: "km/h" },
        heading: { index: 2 },
        lat: { index: 3 },
        lon: { index: 4 },
        surface: { index: 5 },
        load: { index: 6 },
        direction: { index: 7 },
      });
    });

    it(`reads ${c.language} ground, load and direction words`, () => {
      for (const [word, kind] of c.surfaces) expect(parseSurface(word), word).toBe(kind);
      expect(parseLoadState(c.laden)).toBe("laden");
      expect(parseReverse(c.reverse)).toBe(true);
    });
  }

  it("does not take a yaw-rate column for the speed (French vitesse de lacet)", () => {
    const columns = guessColumns(
      "telematics",
      ["Temps", "Vitesse de lacet (°/s)", "Vitesse (km/h)"],
      ["0", "1", "2"],
    );
    expect(columns.yawRate?.index).toBe(1);
    expect(columns.speed?.index).toBe(2);
  });

  it("does not take an engine-hours column for the time (French heures moteur)", () => {
    const columns = guessColumns(
      "telematics",
      ["Heures moteur", "Heure", "Vitesse"],
      ["1", "2", "3"],
    );
    expect(columns.time?.index).toBe(1);
    expect(columns.hourMeter?.index).toBe(0);
  });
});
