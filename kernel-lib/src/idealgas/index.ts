// Public exports of idealgas/ (filled by the area as it lands).
export {};
