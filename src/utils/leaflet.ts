import L from 'leaflet';
import 'leaflet/dist/leaflet.css';

// leaflet-geoman extends the global `L`; this module must be imported before it.
(window as unknown as { L: typeof L }).L = L;

export default L;
