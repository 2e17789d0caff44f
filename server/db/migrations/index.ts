import { Foundation1796204951114 } from './1796204951114-Foundation.js';
import { ShipMap1796208163044 } from './1796208163044-ShipMap.js';
import { DeckPlans1796208850383 } from './1796208850383-DeckPlans.js';
import { Collection1796215405776 } from './1796215405776-Collection.js';
import { ConditionReports1796217167359 } from './1796217167359-ConditionReports.js';
import { Incidents1796217615866 } from './1796217615866-Incidents.js';
import { Risks1796217692917 } from './1796217692917-Risks.js';
import { IncidentPublicNote1796284572668 } from './1796284572668-IncidentPublicNote.js';
import { HazardVersions1796284659278 } from './1796284659278-HazardVersions.js';
import { SearchStemming1796285944020 } from './1796285944020-SearchStemming.js';
import { MediaPublicUse1796286347768 } from './1796286347768-MediaPublicUse.js';
import { DeckFramesRiskScale1796298366780 } from './1796298366780-DeckFramesRiskScale.js';
import { RepairProjects1796409916267 } from './1796409916267-RepairProjects.js';
import { GivingSettings1796409933567 } from './1796409933567-GivingSettings.js';
import { Tours1796410076474 } from './1796410076474-Tours.js';
import { Interpretation1796410455538 } from './1796410455538-Interpretation.js';
import { Giving1796410465930 } from './1796410465930-Giving.js';
import { GivingRecentGifts1796413876346 } from './1796413876346-GivingRecentGifts.js';
import { TourSearch1796414821822 } from './1796414821822-TourSearch.js';

/** Every migration, oldest first; run at start by openDatabase(). */
export const migrations = [Foundation1796204951114, ShipMap1796208163044, DeckPlans1796208850383, Collection1796215405776, ConditionReports1796217167359, Incidents1796217615866, Risks1796217692917, IncidentPublicNote1796284572668, HazardVersions1796284659278, SearchStemming1796285944020, MediaPublicUse1796286347768, DeckFramesRiskScale1796298366780, RepairProjects1796409916267, GivingSettings1796409933567, Tours1796410076474, Interpretation1796410455538, Giving1796410465930, GivingRecentGifts1796413876346, TourSearch1796414821822];
