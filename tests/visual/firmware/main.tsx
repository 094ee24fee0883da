import { mountHarness } from '../shared/mount-harness';
import './harness.css';
import { Harness } from './harness';

mountHarness(Harness);
